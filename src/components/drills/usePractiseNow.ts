// Loads what "Practise now" chooses from (practise-now.ts): the student's plans (through the
// assignments store, so the plans list below shares the request) and the practised places of the
// active instrument.
// A failed load leaves its part out: the card still offers what it knows.
import { computed, onMounted, ref } from 'vue'
import { fetchPositions, type PositionFigures } from '@/api/progress'
import type { DrillId } from '@/contract/drills'
import { lastDrill } from '@/drills/engine/remembered-settings'
import { DRILL_LIST } from '@/drills/registry'
import { useAssignmentsStore } from '@/stores/assignments'
import { useAuthStore } from '@/stores/auth'
import { choosePractice, hasPractised, type PracticeFacts } from './practise-now'

export function usePractiseNow() {
  const auth = useAuthStore()
  const assignments = useAssignmentsStore()
  const stored = lastDrill()
  const last = DRILL_LIST.some((d) => d.id === stored) ? (stored as DrillId) : null
  const places = ref<PositionFigures[]>([])
  const ready = ref(false)

  onMounted(async () => {
    const student = auth.user?.role === 'student'
    await Promise.all([
      student ? assignments.loadAssigned() : undefined,
      fetchPositions({}).then(
        (answer) => (places.value = answer.positions),
        () => undefined,
      ),
    ])
    ready.value = true
  })

  const facts = computed<PracticeFacts>(() => ({
    assigned: assignments.assigned,
    places: places.value,
    last,
  }))
  const choice = computed(() => choosePractice(facts.value))
  return {
    /** False until both loads are over, so the card never shows a guess that changes under a tap. */
    ready,
    choice,
    /** The drill last played here, when it is not already the suggestion. */
    last: computed(() => (choice.value.kind === 'continue' ? null : last)),
    practised: computed(() => hasPractised(facts.value)),
  }
}
