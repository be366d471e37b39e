// The sign-in page checks its fields before calling the API and shows the server's answer.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { mountRoute, nextNavigation } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => vi.unstubAllGlobals())

function stubFetch(status: number, body: unknown) {
  const fetch = vi.fn(
    async () =>
      new Response(JSON.stringify(body), {
        status,
        headers: { 'content-type': 'application/json' },
      }),
  )
  vi.stubGlobal('fetch', fetch)
  return fetch
}

describe('SignInView', () => {
  it('when the fields are empty, then no request is made and both fields explain what is missing', async () => {
    const fetch = stubFetch(200, {})
    const { wrapper } = await mountRoute('/sign-in')
    await wrapper.find('form').trigger('submit')
    await flushPromises()
    expect(fetch).not.toHaveBeenCalled()
    expect(wrapper.text()).toContain('Enter your e-mail.')
    expect(wrapper.text()).toContain('Enter your password.')
  })

  it('when the server refuses the password, then its message is shown', async () => {
    stubFetch(401, { error: { code: 'unauthorized', message: 'E-mail or password is not right.' } })
    const { wrapper } = await mountRoute('/sign-in')
    await wrapper.find('input[name="email"]').setValue('noor@example.test')
    await wrapper.find('input[name="password"]').setValue('wrong one')
    await wrapper.find('form').trigger('submit')
    await flushPromises()
    expect(wrapper.find('[data-testid="form-error"]').text()).toBe(
      'E-mail or password is not right.',
    )
  })

  it('when sign-in succeeds, then a student lands on the practice page', async () => {
    const user = { id: '1', email: 'noor@example.test', name: 'Noor', role: 'student' }
    stubApi({
      'POST /api/auth/login': { user: { ...user, createdAt: '' } },
      'GET /api/plans/assigned': { assignments: [] }, // the practice page lists the student's plans
    })
    const { wrapper, router } = await mountRoute('/sign-in')
    await wrapper.find('input[name="email"]').setValue('noor@example.test')
    await wrapper.find('input[name="password"]').setValue('right one!!')
    const arrived = nextNavigation(router) // the practice page loads on first visit, as in the app
    await wrapper.find('form').trigger('submit')
    await arrived
    expect(router.currentRoute.value.name).toBe('practice')
  })
})
