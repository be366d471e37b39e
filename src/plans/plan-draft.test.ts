// The plan editor's due-date warning (issue 16: a due date in the past was accepted without a word).
import { describe, expect, it } from 'vitest'
import { dueDateWarning, localDate } from './plan-draft'

describe('dueDateWarning', () => {
  const now = new Date(2026, 11, 3, 12, 0) // 3 Dec 2026, noon local time
  it('warns for a date before today', () => {
    expect(dueDateWarning('2026-12-02', now)).toMatch(/has passed/)
  })
  it('says nothing for today, a later date or no date', () => {
    expect(dueDateWarning(localDate(now.toISOString()), now)).toBe('')
    expect(dueDateWarning('2026-12-10', now)).toBe('')
    expect(dueDateWarning('', now)).toBe('')
  })
})
