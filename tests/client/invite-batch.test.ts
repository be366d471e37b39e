// Issue 16 item 7 in the invite dialog: several addresses at once with a personal note go out as one
// batch, and the answer says what became of each address.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import InviteDialog from '../../src/components/studio/InviteDialog.vue'
import { batchSummary, splitAddresses } from '../../src/components/studio/invite-addresses'
import { mountWithApp } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('the addresses typed', () => {
  it('splits on commas, semicolons, spaces and lines, each address once', () => {
    expect(splitAddresses(' a@x.test, b@x.test;c@x.test\n a@x.test  d@x.test ')).toEqual([
      'a@x.test',
      'b@x.test',
      'c@x.test',
      'd@x.test',
    ])
  })
  it('sums up what became of each address', () => {
    const r = (email: string, outcome: 'sent' | 'resent' | 'member') => ({
      email,
      outcome,
      invitation: null,
    })
    expect(
      batchSummary([r('a@x.test', 'sent'), r('b@x.test', 'sent'), r('c@x.test', 'resent')]),
    ).toBe('Invitations sent to 2 addresses. Already invited, new link sent: c@x.test.')
    expect(batchSummary([r('m@x.test', 'member')])).toBe('Already in the studio: m@x.test.')
  })
})

describe('InviteDialog with several addresses', () => {
  it('when two addresses and a note are sent, then one batch request carries them and the summary shows', async () => {
    const api = stubApi({
      'POST /api/studio/studios/st1/invitations/batch': {
        results: [
          { email: 'wren@example.test', outcome: 'sent', invitation: null },
          { email: 'ivo@example.test', outcome: 'member', invitation: null },
        ],
      },
      'GET /api/studio/studios': { studios: [] },
    })
    const { wrapper } = mountWithApp(InviteDialog, {
      props: { modelValue: false, studioId: 'st1' },
      attachTo: document.body,
    })
    await wrapper.setProps({ modelValue: true })
    await flushPromises()
    const set = (selector: string, value: string) => {
      const el = document.querySelector(selector) as HTMLInputElement
      el.value = value
      el.dispatchEvent(new Event('input'))
    }
    set('input[name="invite-email"]', 'wren@example.test, ivo@example.test')
    set('textarea[name="invite-note"]', 'Welcome to the studio!')
    await flushPromises()
    ;(document.querySelector('button[type="submit"]') as HTMLButtonElement).click()
    await flushPromises()
    await flushPromises()
    expect(api.sent('POST', '/api/studio/studios/st1/invitations/batch')[0]!.body).toEqual({
      emails: ['wren@example.test', 'ivo@example.test'],
      message: 'Welcome to the studio!',
    })
    expect(document.querySelector('[data-testid="invite-sent"]')!.textContent).toContain(
      'Invitations sent to 1 address. Already in the studio: ivo@example.test.',
    )
    wrapper.unmount()
  }, 30_000) // a full Vuetify dialog mounts slowly in jsdom when the machine is busy
})
