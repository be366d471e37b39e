// Issue 16 item 7 in the pages: the teacher makes an open link and copies it; a newcomer opening it
// gives their own address (an open link is not bound to one).
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import InviteLinkPanel from '../../src/components/studio/InviteLinkPanel.vue'
import { mountRoute, mountWithApp } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

const LINK = {
  id: 'l1',
  studioId: 'st1',
  studioName: 'Cedar Hollow',
  maxUses: 5,
  uses: 0,
  status: 'open',
  expiresAt: '2031-01-10T10:00:00Z',
  createdAt: '2031-01-03T10:00:00Z',
}
const URL_SHOWN = 'http://localhost:3000/invitations/accept?token=abcdefghijklmnopqrstuvwxyz0123'

describe('InviteLinkPanel', () => {
  it('when the teacher creates a link, then it is shown once with its limits and can be copied', async () => {
    const api = stubApi({
      'GET /api/studio/invite-links': { links: [] },
      'POST /api/studio/studios/st1/invite-links': { link: LINK, url: URL_SHOWN },
    })
    const writeText = vi.fn(async () => undefined)
    Object.defineProperty(navigator, 'clipboard', { value: { writeText }, configurable: true })
    const { wrapper } = mountWithApp(InviteLinkPanel, { props: { studioId: 'st1' } })
    await flushPromises()
    await wrapper.find('input[name="link-uses"]').setValue('5')
    await wrapper.find('input[name="link-days"]').setValue('7')
    await wrapper
      .findAll('button')
      .find((b) => b.text() === 'Create link')!
      .trigger('click')
    await flushPromises()
    expect(api.sent('POST', '/api/studio/studios/st1/invite-links')[0]!.body).toEqual({
      maxUses: 5,
      days: 7,
    })
    expect(wrapper.find('input[name="invite-link"]').element).toHaveProperty('value', URL_SHOWN)
    expect(wrapper.find('[data-testid="invite-link-item"]').text()).toContain('0 of 5 uses')
    await wrapper.find('[data-testid="invite-link-copy"]').trigger('click')
    await flushPromises()
    expect(writeText).toHaveBeenCalledWith(URL_SHOWN)
    expect(wrapper.text()).toContain('Copied.')
  })
})

describe('InvitationAcceptView with an open link', () => {
  it('when a newcomer joins with a link, then they give their own address and it is sent', async () => {
    const api = stubApi({
      'GET /api/invitations/preview': {
        invitation: {
          studioName: 'Cedar Hollow',
          teacherName: 'Marta',
          email: null,
          expiresAt: '2031-01-10T10:00:00Z',
          accountExists: false,
        },
      },
    })
    const { wrapper } = await mountRoute('/invitations/accept?token=abcdefghijklmnopqrstuvwxyz')
    await flushPromises()
    expect(wrapper.text()).toContain('An invitation link')
    await wrapper.find('input[name="name"]').setValue('Wren')
    await wrapper.find('input[name="email"]').setValue('wren@example.test')
    await wrapper.find('input[type="password"]').setValue('a long password here')
    await wrapper.find('form').trigger('submit')
    await flushPromises()
    await flushPromises()
    expect(api.sent('POST', '/api/invitations/accept')[0]!.body).toEqual({
      token: 'abcdefghijklmnopqrstuvwxyz',
      name: 'Wren',
      password: 'a long password here',
      email: 'wren@example.test',
    })
  })
})
