// The break reminder: shown after a long continuous stretch, reset by a pause or by "Got it".
import { mount } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createVuetify } from 'vuetify'
import * as components from 'vuetify/components'
import BreakReminder from '../../src/components/BreakReminder.vue'
import {
  BREAK_AFTER_MINUTES,
  IDLE_RESET_MINUTES,
  useBreakReminder,
} from '../../src/composables/useBreakReminder'

const MINUTE = 60_000

beforeEach(() => {
  vi.useFakeTimers()
  vi.setSystemTime(new Date('2026-12-01T10:00:00Z'))
  sessionStorage.clear()
  useBreakReminder().dismiss()
})
afterEach(() => vi.useRealTimers())

// Answers every 20 s for `minutes` minutes.
function practise(minutes: number) {
  const { markActivity } = useBreakReminder()
  for (let t = 0; t <= minutes * 3; t += 1) {
    markActivity()
    vi.advanceTimersByTime(MINUTE / 3)
  }
  markActivity()
}

describe('useBreakReminder', () => {
  it(`is not due before ${BREAK_AFTER_MINUTES} minutes, and due after`, () => {
    const reminder = useBreakReminder()
    practise(BREAK_AFTER_MINUTES - 2)
    expect(reminder.due.value).toBe(false)
    practise(3)
    expect(reminder.due.value).toBe(true)
    expect(reminder.minutes.value).toBeGreaterThanOrEqual(BREAK_AFTER_MINUTES)
  })

  it('a pause counts as a break: the stretch starts again', () => {
    const reminder = useBreakReminder()
    practise(20)
    vi.advanceTimersByTime((IDLE_RESET_MINUTES + 1) * MINUTE)
    practise(10)
    expect(reminder.due.value).toBe(false)
  })

  it('"Got it" hides it until another full stretch has passed', () => {
    const reminder = useBreakReminder()
    practise(BREAK_AFTER_MINUTES + 1)
    reminder.dismiss()
    expect(reminder.due.value).toBe(false)
    practise(BREAK_AFTER_MINUTES - 5)
    expect(reminder.due.value).toBe(false)
  })
})

describe('BreakReminder', () => {
  it('suggests stretching and defers to medical advice, and goes away on Got it', async () => {
    practise(BREAK_AFTER_MINUTES + 1)
    const wrapper = mount(BreakReminder, { global: { plugins: [createVuetify({ components })] } })
    const text = wrapper.find('[data-testid="break-reminder"]').text()
    expect(text).toContain('stretch your wrists')
    expect(text).toContain('doctor')
    await wrapper.find('[data-testid="break-reminder-dismiss"]').trigger('click')
    expect(wrapper.find('[data-testid="break-reminder"]').exists()).toBe(false)
  })
})
