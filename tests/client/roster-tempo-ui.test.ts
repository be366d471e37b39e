// The roster's "Fastest clean tempo": a column on the laptop table ("96 BPM · Range Runs", "—" when
// none), a short line on the phone list and a figure on the student's glance (API stubbed).
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import RosterPhoneList from '../../src/components/studio/RosterPhoneList.vue'
import RosterTable from '../../src/components/studio/RosterTable.vue'
import StudentGlance from '../../src/components/studio/StudentGlance.vue'
import type { RosterRow } from '../../src/contract/roster'
import { mountWithApp } from '../helpers/mount'

afterEach(() => {
  vi.unstubAllGlobals()
  vi.restoreAllMocks()
})

function row(id: string, name: string, fastestTempo: RosterRow['fastestTempo']): RosterRow {
  return {
    id,
    name,
    email: `${id}@cedar-hollow.test`,
    studios: [{ id: 's-1', name: 'Cedar Hollow Low End' }],
    lastPracticeAt: null,
    minutesThisWeek: 0,
    attemptsThisWeek: 0,
    accuracy: null,
    recall: { medianMs: null, previousMedianMs: null, change: null, direction: null },
    plans: { assigned: 0, complete: 0, overdue: 0, targetsMet: 0, targetsTotal: 0 },
    planCompletion: null,
    weakSpots: [],
    status: 'on-track',
    attention: [],
    instrument: null,
    fastestTempo,
    sharesFrom: null,
  }
}
const ROWS = [
  row('u-1', 'Noor Fastline', { bpm: 96, drill: 'runs', settings: 'C major, frets 2–5' }),
  row('u-2', 'Wren Notyet', null),
]

/** jsdom has no screen: media queries answer as on a 1280 px laptop, so the table shows, not the list. */
function onLaptop() {
  const matchMedia = window.matchMedia.bind(window)
  vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => {
    const minWidth = /min-width: (\d+)px/.exec(query)?.[1]
    return { ...matchMedia(query), matches: minWidth !== undefined && 1280 >= Number(minWidth) }
  })
}

function stubRoster(items: RosterRow[]) {
  const fetch = vi.fn(async (url: string) => {
    const body = /\/api\/studio\/roster/.test(url) ? { total: items.length, items } : {}
    return new Response(JSON.stringify(body), {
      status: 200,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return fetch
}

describe('roster fastest clean tempo', () => {
  it('when the table shows students, then the tempo column names BPM and drill, or a dash', async () => {
    stubRoster(ROWS)
    onLaptop()
    const { wrapper } = mountWithApp(RosterTable)
    await flushPromises()

    expect(wrapper.find('thead').text()).toContain('Fastest clean tempo')
    const [noor, wren] = wrapper.findAll('[data-testid="roster-tempo"]')
    expect(noor!.find('.text-no-wrap').text()).toBe('96 BPM')
    expect(noor!.find('.text-caption').text()).toBe('Range Runs')
    expect(wren!.text()).toBe('—')
    expect(wrapper.find('[data-testid="roster-tempo"]').attributes('title')).toBe(
      'C major, frets 2–5',
    )
  })

  it('when the phone list shows students, then only the one with a tempo has the tempo line', () => {
    const { wrapper } = mountWithApp(RosterPhoneList, { props: { rows: ROWS } })
    const items = wrapper.findAll('[data-testid="roster-phone-item"]')
    expect(items[0]!.find('[data-testid="roster-phone-tempo"]').text()).toBe(
      'Fastest clean tempo 96 BPM · Range Runs',
    )
    expect(items[1]!.find('[data-testid="roster-phone-tempo"]').exists()).toBe(false)
  })

  it("when the teacher opens a student, then the glance shows the week's fastest clean tempo", () => {
    const shown = (student: RosterRow) =>
      mountWithApp(StudentGlance, { props: { student } })
        .wrapper.find('[data-testid="glance-tempo"]')
        .text()
    expect(shown(ROWS[0]!)).toContain('96 BPM · Range Runs')
    expect(shown(ROWS[1]!)).toContain('—')
  })
})
