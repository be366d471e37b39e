// The student's plan list and the teacher's plan editor, with the API stubbed at fetch.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import AssignedPlans from '../../src/components/plans/AssignedPlans.vue'
import PlanCard from '../../src/components/plans/PlanCard.vue'
import PlanEditorDialog from '../../src/components/plans/PlanEditorDialog.vue'
import { DrillPresetSchema } from '../../src/contract/drills'
import type { Plan } from '../../src/contract/plans'
import { defaultPreset } from '../../src/plans/preset-fields'
import type { PublicUser } from '../../src/contract/users'
import { useAuthStore } from '../../src/stores/auth'
import { mountRoute, mountWithApp } from '../helpers/mount'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

type Handler = (url: string, init: RequestInit) => unknown
function stubApi(routes: Record<string, Handler>) {
  const fetch = vi.fn(async (url: string, init: RequestInit = {}) => {
    const key = `${init.method ?? 'GET'} ${url.split('?')[0]}`
    const handler = routes[key]
    const body = handler
      ? handler(url, init)
      : { error: { code: 'not_found', message: `no stub for ${key}` } }
    return new Response(JSON.stringify(body), {
      status: handler ? 200 : 404,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return fetch
}

const ITEM_RECALL = '11111111-1111-4111-8111-111111111111'
const ITEM_CYCLE = '22222222-2222-4222-8222-222222222222'
const ASSIGNMENT = {
  id: 'a1',
  planId: 'p1',
  title: 'Week 3',
  notes: 'Slow and steady.',
  dueAt: new Date(Date.now() + 5 * 864e5).toISOString(),
  assignedAt: new Date().toISOString(),
  teacher: { id: 't', name: 'Marta Ilves' },
  student: { id: 's', name: 'Noor' },
  targetsMet: 1,
  complete: false,
  overdue: false,
  commentCount: 0,
  items: [
    {
      id: ITEM_RECALL,
      position: 0,
      preset: defaultPreset('recall'),
      recordings: [],
      references: [],
      target: { kind: 'accuracy', minAccuracy: 0.9, maxMedianMs: 2000, minAttempts: 4 },
      progress: {
        kind: 'accuracy',
        met: true,
        ratio: 1,
        attempts: 4,
        needed: 4,
        accuracy: 1,
        medianMs: 1500,
      },
    },
    {
      id: ITEM_CYCLE,
      position: 1,
      preset: defaultPreset('cycle'),
      recordings: [],
      references: [],
      target: { kind: 'all-keys' },
      progress: {
        kind: 'all-keys',
        met: false,
        ratio: 2 / 3,
        keysPlayed: ['C', 'F'],
        keysMissing: ['Bb'],
      },
    },
  ],
}

describe('AssignedPlans', () => {
  it('when the student has a plan, then each drill has a Start link with its plan item and its progress', async () => {
    stubApi({ 'GET /api/plans/assigned': () => ({ assignments: [ASSIGNMENT] }) })
    const { wrapper } = mountWithApp(AssignedPlans)
    await flushPromises()
    const starts = wrapper.findAll('a[href^="/practice/"]').map((a) => a.attributes('href'))
    expect(starts).toEqual([
      `/practice/recall?planItem=${ITEM_RECALL}`,
      `/practice/cycle?planItem=${ITEM_CYCLE}`,
    ])
    const recallRow = wrapper.find(`[data-testid="plan-item-row-${ITEM_RECALL}"]`).text()
    expect(recallRow).toContain('Target met')
    expect(recallRow).toContain('4 of 4 answers · 100 % right · median 1.5 s')
    expect(wrapper.find(`[data-testid="plan-item-row-${ITEM_CYCLE}"]`).text()).toContain(
      '2 of 3 keys · still to play: B♭',
    )
    expect(wrapper.text()).toContain('From Marta Ilves · 1 of 2 targets met')
  })

  it('when an item counts strings from the highest, then the student reads them on their own instrument', async () => {
    const recall = defaultPreset('recall')
    const fromTop = {
      ...ASSIGNMENT,
      items: [
        {
          ...ASSIGNMENT.items[0]!,
          preset: {
            ...recall,
            settings: { ...recall.settings, strings: { from: 'highest', to: '2nd-highest' } },
          },
        },
      ],
    }
    const fiveString = {
      id: 'i5',
      name: 'Five-string',
      presetId: 'bass-5',
      tuning: [23, 28, 33, 38, 43], // B0 E1 A1 D2 G2 (scientific pitch notation)
      frets: 24,
      scaleLengthMm: 889,
      handedness: 'right',
      accidentals: 'flat',
      referenceHz: 440,
      soundOn: true,
      volume: 0.6,
      isActive: true,
      createdAt: new Date().toISOString(),
    }
    stubApi({
      'GET /api/plans/assigned': () => ({ assignments: [fromTop] }),
      'GET /api/instruments': () => ({ instruments: [fiveString] }),
      'GET /api/instruments/presets': () => ({ presets: [] }),
    })
    const { wrapper } = mountWithApp(AssignedPlans)
    await flushPromises()
    // the two highest strings of B E A D G are D and G (common practice: string 1 = the highest)
    expect(wrapper.get('[data-testid="on-my-instrument"]').text()).toMatch(
      /^On your Five-string: strings D–G, frets \d+–\d+$/,
    )
  })

  it('when there is no plan, then the student is told where plans will appear', async () => {
    stubApi({ 'GET /api/plans/assigned': () => ({ assignments: [] }) })
    const { wrapper } = mountWithApp(AssignedPlans)
    await flushPromises()
    expect(wrapper.text()).toContain('No plans yet.')
  })
})

describe('PlanEditorDialog', () => {
  it('when the title is empty, then nothing is sent; with a title, the plan is posted with its drill and students', async () => {
    const posted: unknown[] = []
    const fetch = stubApi({
      'POST /api/plans': (_url, init) => {
        posted.push(JSON.parse(String(init.body)))
        return {
          plan: {
            id: 'p9',
            title: 'x',
            notes: '',
            dueAt: null,
            createdAt: '',
            updatedAt: '',
            items: [],
            assignees: [],
          },
        }
      },
    })
    const { wrapper } = mountWithApp(PlanEditorDialog, {
      props: {
        modelValue: false,
        plan: null,
        students: [{ id: 's1', name: 'Noor', instrument: null }],
      },
      attachTo: document.body,
    })
    await wrapper.setProps({ modelValue: true })
    await flushPromises()
    const save = () =>
      (document.querySelector('[data-testid="plan-save"]') as HTMLButtonElement).click()
    save()
    await flushPromises()
    expect(fetch).not.toHaveBeenCalled()
    expect(document.body.textContent).toContain('Give the plan a title.')
    const title = [...document.querySelectorAll('input')].find((i) =>
      i.labels?.[0]?.textContent?.includes('Title'),
    )!
    title.value = 'Low strings'
    title.dispatchEvent(new Event('input'))
    save()
    await flushPromises()
    expect(posted).toEqual([
      expect.objectContaining({
        title: 'Low strings',
        dueAt: null,
        studentIds: [],
        items: [expect.objectContaining({ preset: expect.objectContaining({ drill: 'recall' }) })],
      }),
    ])
    expect(wrapper.emitted('saved')).toHaveLength(1)
    wrapper.unmount()
  }, 30_000) // a full Vuetify dialog mounts slowly in jsdom when the machine is busy
})

// 5-string bass B0 E1 A1 D2 G2 and guitar E2 A2 D3 G3 B3 E4 (common practice)
const FIVE = { name: 'Five', description: '5-string bass (B E A D G)', leftHanded: false }
const neck = (tuning: number[]) => ({ tuning, frets: 24, accidentals: 'flat' as const })
const STUDENTS = [
  { id: 's1', name: 'Tobiah', instrument: { ...FIVE, ...neck([23, 28, 33, 38, 43]) } },
  {
    id: 's2',
    name: 'Wren',
    instrument: { ...FIVE, description: '6-string guitar', ...neck([40, 45, 50, 55, 59, 64]) },
  },
]

describe('instrument-aware plans', () => {
  it('when a plan for two students is edited, then each item shows the strings on each instrument', async () => {
    stubApi({})
    const preset = DrillPresetSchema.parse({
      drill: 'recall',
      settings: {
        ...defaultPreset('recall').settings,
        strings: { from: 'lowest', to: '2nd-lowest' },
      },
    })
    const plan: Plan = {
      ...{ id: 'p1', title: 'Low end', notes: '', dueAt: null, createdAt: '', updatedAt: '' },
      items: [
        {
          id: ITEM_RECALL,
          position: 0,
          preset,
          target: { kind: 'sessions', count: 2 },
        },
      ],
      assignees: STUDENTS.map((s) => ({
        assignmentId: `a-${s.id}`,
        studentId: s.id,
        name: s.name,
        assignedAt: '',
      })),
    }
    const { wrapper } = mountWithApp(PlanEditorDialog, {
      props: { modelValue: false, plan, students: STUDENTS },
      attachTo: document.body,
    })
    await wrapper.setProps({ modelValue: true })
    await flushPromises()
    const line = (id: string) =>
      document.querySelector(`[data-testid="preview-${id}"]`)?.textContent
    expect(line('s1')).toContain('Tobiah (5-string bass (B E A D G)): strings B–E, frets 0–5')
    expect(line('s2')).toContain('Wren (6-string guitar): strings low E–A, frets 0–5')
    wrapper.unmount()
  }, 30_000)

  it('when the plans list answers, then each assignee shows finished or how far along', async () => {
    const progress = (targetsMet: number, share: number, complete = false) => ({
      ...{ targetsMet, targetsTotal: 2, share, complete, overdue: false },
    })
    const plan = {
      ...{ id: 'p1', title: 'Low end', notes: '', dueAt: null, createdAt: '', updatedAt: '' },
      items: [],
      assignees: [
        {
          assignmentId: 'a1',
          studentId: 's1',
          name: 'Tobiah',
          assignedAt: '',
          progress: progress(2, 1, true),
        },
        {
          assignmentId: 'a2',
          studentId: 's2',
          name: 'Wren',
          assignedAt: '',
          progress: progress(1, 0.7),
        },
      ],
    }
    const { wrapper } = mountWithApp(PlanCard, { props: { plan } })
    expect(wrapper.get('[data-testid="assignee-s1"]').text()).toContain('Tobiah: finished')
    expect(wrapper.get('[data-testid="assignee-s2"]').text()).toContain(
      'Wren: 1 of 2 targets · 70 %',
    )
    expect(wrapper.text()).toContain('2 assigned, 1 finished')
  })
})

describe('InvitationAcceptView', () => {
  it('when a new student opens a valid link, then the teacher, the studio and the sign-up fields are shown', async () => {
    stubApi({
      'GET /api/invitations/preview': () => ({
        invitation: {
          studioName: 'Cedar Hollow',
          teacherName: 'Marta Ilves',
          email: 'wren@example.test',
          expiresAt: new Date().toISOString(),
          accountExists: false,
        },
      }),
    })
    const { wrapper } = await mountRoute('/invitations/accept?token=abcdefghijklmnopqrstuvwxyz')
    expect(wrapper.text()).toContain('Marta Ilves invites you to Cedar Hollow')
    expect(wrapper.find('input[name="name"]').exists()).toBe(true)
    expect(wrapper.text()).toContain('Create my account and join')
  })

  it('when a student of another studio joins, then they choose what earlier practice to share', async () => {
    const sent: unknown[] = []
    const student = { id: 'u1', email: 'wren@example.test', name: 'Wren', role: 'student' }
    stubApi({
      'GET /api/invitations/preview': () => ({
        invitation: {
          ...{ studioName: 'Second Studio', teacherName: 'Oskar', email: null },
          ...{ expiresAt: new Date().toISOString(), accountExists: false },
        },
      }),
      'GET /api/studio/memberships': () => ({
        memberships: [{ studioId: 's1', studioName: 'First', teacherName: 'Ilse' }],
      }),
      'POST /api/invitations/accept': (_url, init) => {
        sent.push(JSON.parse(String(init.body)))
        return { user: student, studio: { id: 's2', name: 'Second Studio' }, alreadyMember: false }
      },
    })
    const { wrapper, pinia } = await mountRoute(
      '/invitations/accept?token=abcdefghijklmnopqrstuvwxyz',
    )
    useAuthStore(pinia).user = student as PublicUser // signed in (mountRoute leaves guards out)
    await flushPromises()
    const choice = wrapper.get('[data-testid="share-history"]')
    expect(choice.text()).toContain('What earlier practice may Oskar see?')
    const checked = () => choice.findAll('input:checked').map((i) => i.attributes('value'))
    expect(checked()).toEqual(['from-now'])
    await choice.get('[data-testid="share-history-everything"] input').setValue(true)
    await wrapper
      .findAll('button')
      .find((b) => b.text() === 'Join Second Studio')!
      .trigger('click')
    await flushPromises()
    expect(sent).toEqual([expect.objectContaining({ shareHistory: 'everything' })])
  })
})
