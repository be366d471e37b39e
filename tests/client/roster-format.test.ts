// How the roster words last practice (issue 16: practice yesterday evening read as "today").
import { describe, expect, it } from 'vitest'
import { lastPractice } from '@/components/studio/roster-format'

describe('lastPractice', () => {
  const now = new Date('2026-12-03T07:00:00Z') // 09:00 in Tallinn
  it('says "yesterday" for practice at 22:00 the evening before, though under 24 hours ago', () => {
    expect(lastPractice('2026-12-02T20:00:00Z', now, 'Europe/Tallinn')).toBe('yesterday')
  })
  it('says "today" for practice earlier the same local day, and counts days across midnight', () => {
    expect(lastPractice('2026-12-02T23:30:00Z', now, 'Europe/Tallinn')).toBe('today')
    expect(lastPractice('2026-11-30T23:30:00Z', now, 'Europe/Tallinn')).toBe('2 days ago')
    expect(lastPractice(null, now, 'Europe/Tallinn')).toBe('never')
  })
})
