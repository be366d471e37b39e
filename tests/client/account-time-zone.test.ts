// Issue 16: Account shows the user's time zone (the browser's unless chosen) and every date the app
// writes follows it.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { dateText, displayZone } from '@/composables/local-dates'
import { lastPractice } from '@/components/studio/roster-format'
import { browserTimeZone } from '@/stores/time-zone'
import { mountRoute } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  displayZone.value = null
})

const TOKYO = { setting: { timeZone: 'Asia/Tokyo', followsBrowser: false } }

describe('the account time zone', () => {
  it('when the account keeps Tokyo, then Account shows it and dates are written in Tokyo', async () => {
    const api = stubApi({ 'POST /api/account/time-zone/browser': TOKYO })
    const { wrapper } = await mountRoute('/account')
    expect(api.sent('POST', '/api/account/time-zone/browser')[0]!.body).toEqual({
      timeZone: browserTimeZone(),
    })
    const card = wrapper.find('[data-testid="time-zone-card"]')
    expect(card.find('input[name="time-zone"]').element).toHaveProperty('value', 'Asia/Tokyo')
    expect(card.find('[data-testid="time-zone-keep"] input').element).toHaveProperty(
      'checked',
      true,
    )
    // 20:00 UTC on 3 Dec is 05:00 on 4 Dec in Tokyo (UTC+9, no daylight saving).
    expect(dateText('2026-12-03T20:00:00Z', { day: 'numeric', month: 'numeric' })).toMatch(/4/)
    const now = new Date('2026-12-04T01:00:00Z') // 10:00 on 4 Dec in Tokyo
    expect(lastPractice('2026-12-03T14:30:00Z', now)).toBe('yesterday') // 23:30 on 3 Dec there
    expect(lastPractice('2026-12-03T15:30:00Z', now)).toBe('today') // 00:30 on 4 Dec there
  })

  it('when the user switches to following the browser, then the browser zone is saved as followed', async () => {
    const api = stubApi({
      'POST /api/account/time-zone/browser': TOKYO,
      'PUT /api/account/time-zone': { setting: { timeZone: 'UTC', followsBrowser: true } },
    })
    const { wrapper } = await mountRoute('/account')
    const card = wrapper.find('[data-testid="time-zone-card"]')
    await card.find('input[type="radio"][value="true"]').setValue(true)
    await card.find('form').trigger('submit')
    await flushPromises()
    expect(api.sent('PUT', '/api/account/time-zone')[0]!.body).toEqual({
      timeZone: browserTimeZone(),
      followsBrowser: true,
    })
    expect(card.text()).toContain('Time zone saved: UTC.')
    // 23:30 UTC on 3 Dec: "yesterday" in UTC at 01:00 on the 4th, though "today" in Tokyo.
    expect(lastPractice('2026-12-03T23:30:00Z', new Date('2026-12-04T01:00:00Z'))).toBe('yesterday')
  })

  it('when the saved zone cannot be loaded, then Account says so and dates use the browser zone', async () => {
    stubApi({})
    const { wrapper } = await mountRoute('/account')
    expect(wrapper.find('[data-testid="time-zone-card"]').text()).toContain(
      'Could not load your saved zone',
    )
    expect(displayZone.value).toBeNull()
  })
})
