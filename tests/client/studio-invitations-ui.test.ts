// Issue 16: the invite dialog shows no error right after "Invitation sent"; reopening an accepted
// invitation points to signing in, not to asking for a new link.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import InviteDialog from '../../src/components/studio/InviteDialog.vue'
import { mountRoute, mountWithApp } from '../helpers/mount'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

function stubApi(routes: Record<string, { status?: number; body: unknown }>) {
  const fetch = vi.fn(async (url: string, init: RequestInit = {}) => {
    const answer = routes[`${init.method ?? 'GET'} ${url.split('?')[0]}`]
    return new Response(JSON.stringify(answer?.body ?? { error: { code: 'x', message: url } }), {
      status: answer ? (answer.status ?? 200) : 404,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return fetch
}

const INVITATION = {
  id: 'i1',
  studioId: 'st1',
  studioName: 'Cedar Hollow',
  email: 'wren@example.test',
  status: 'pending',
  expiresAt: new Date(Date.now() + 864e5).toISOString(),
  acceptedAt: null,
  createdAt: new Date().toISOString(),
}

describe('InviteDialog', () => {
  it('when an invitation is sent, then the success shows and the emptied field shows no error', async () => {
    stubApi({
      'POST /api/studio/studios/st1/invitations': {
        body: { invitation: INVITATION, resent: false },
      },
      'GET /api/studio/studios': { body: { studios: [] } },
    })
    const { wrapper } = mountWithApp(InviteDialog, {
      props: { modelValue: false, studioId: 'st1' },
      attachTo: document.body,
    })
    await wrapper.setProps({ modelValue: true })
    await flushPromises()
    const input = document.querySelector('input[name="invite-email"]') as HTMLInputElement
    input.value = 'wren@example.test'
    input.dispatchEvent(new Event('input'))
    await flushPromises()
    ;(document.querySelector('button[type="submit"]') as HTMLButtonElement).click()
    await flushPromises()
    await flushPromises()
    const dialog = document.querySelector('[data-testid="invite-dialog"]')!
    expect(dialog.textContent).toContain('Invitation sent to wren@example.test.')
    expect(input.value).toBe('')
    expect(dialog.textContent).not.toContain('Enter an e-mail address')
    wrapper.unmount()
  }, 30_000) // a full Vuetify dialog mounts slowly in jsdom when the machine is busy
})

describe('InvitationAcceptView, an accepted link opened again', () => {
  it('when the invitation was already accepted, then the page offers to sign in', async () => {
    stubApi({
      'GET /api/invitations/preview': {
        status: 410,
        body: {
          error: {
            code: 'invitation_accepted',
            message: 'This invitation was already accepted. Sign in to reach your studio.',
          },
        },
      },
    })
    const { wrapper } = await mountRoute('/invitations/accept?token=abcdefghijklmnopqrstuvwxyz')
    await flushPromises()
    expect(wrapper.get('[data-testid="invitation-problem"]').text()).not.toContain(
      'Ask your teacher',
    )
    expect(wrapper.get('[data-testid="invitation-sign-in"]').text()).toBe('Sign in')
  })
})
