// Practice plans: the teacher's plans and starter library, the student's assigned plans, comment
// threads and recordings.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import { ApiError } from '../api/http'
import * as commentsApi from '../api/comments'
import * as plansApi from '../api/plans'
import * as recordingsApi from '../api/recordings'

const asApiError = (e: unknown) =>
  e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))

export const usePlansStore = defineStore('plans', () => {
  const plans = ref<plansApi.Plan[]>([])
  const starters = ref<plansApi.StarterPlan[]>([])
  const assigned = ref<plansApi.Assignment[]>([])
  const threads = ref<Record<string, commentsApi.PlanComment[]>>({})
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)

  async function load(work: () => Promise<void>) {
    isLoading.value = true
    error.value = null
    try {
      await work()
    } catch (e) {
      error.value = asApiError(e)
    } finally {
      isLoading.value = false
    }
  }

  const loadPlans = () => load(async () => void (plans.value = (await plansApi.listPlans()).plans))
  const loadStarters = () =>
    load(async () => void (starters.value = (await plansApi.fetchStarters()).starters))
  const loadAssigned = () =>
    load(async () => void (assigned.value = (await plansApi.fetchAssigned()).assignments))

  function keep(plan: plansApi.Plan) {
    plans.value = [plan, ...plans.value.filter((p) => p.id !== plan.id)]
    return plan
  }

  // Actions below throw on failure, so the form that called them can show the fields.
  const savePlan = async (id: string | null, body: plansApi.NewPlanBody) =>
    keep((id ? await plansApi.updatePlan(id, body) : await plansApi.createPlan(body)).plan)
  const copyPlan = async (id: string) => keep((await plansApi.copyPlan(id)).plan)
  const assignPlan = async (id: string, studentIds: string[]) =>
    keep((await plansApi.assignPlan(id, studentIds)).plan)
  const unassignPlan = async (id: string, studentId: string) =>
    keep((await plansApi.unassignPlan(id, studentId)).plan)
  async function deletePlan(id: string) {
    await plansApi.deletePlan(id)
    plans.value = plans.value.filter((p) => p.id !== id)
  }

  const loadThread = (assignmentId: string) =>
    load(async () => {
      threads.value = {
        ...threads.value,
        [assignmentId]: (await commentsApi.listComments(assignmentId)).comments,
      }
    })
  async function addComment(assignmentId: string, body: string) {
    const { comment } = await commentsApi.postComment(assignmentId, body)
    threads.value = {
      ...threads.value,
      [assignmentId]: [...(threads.value[assignmentId] ?? []), comment],
    }
  }
  async function deleteComment(assignmentId: string, commentId: string) {
    await commentsApi.deleteComment(assignmentId, commentId)
    threads.value = {
      ...threads.value,
      [assignmentId]: (threads.value[assignmentId] ?? []).filter((c) => c.id !== commentId),
    }
  }

  /** Changes one item of the assigned plans in place (after an upload or a delete). */
  function updateItem(
    planItemId: string,
    change: (item: plansApi.AssignedItem) => plansApi.AssignedItem,
  ) {
    assigned.value = assigned.value.map((a) => ({
      ...a,
      items: a.items.map((i) => (i.id === planItemId ? change(i) : i)),
    }))
  }
  async function addRecording(planItemId: string, audio: Blob, fileName: string) {
    const { recording } = await recordingsApi.uploadRecording(planItemId, audio, fileName)
    updateItem(planItemId, (item) => ({ ...item, recordings: [recording, ...item.recordings] }))
  }
  async function deleteRecording(planItemId: string, recordingId: string) {
    await recordingsApi.deleteRecording(recordingId)
    updateItem(planItemId, (item) => ({
      ...item,
      recordings: item.recordings.filter((r) => r.id !== recordingId),
    }))
  }

  return {
    plans,
    starters,
    assigned,
    threads,
    isLoading,
    error,
    loadPlans,
    loadStarters,
    loadAssigned,
    savePlan,
    copyPlan,
    assignPlan,
    unassignPlan,
    deletePlan,
    loadThread,
    addComment,
    deleteComment,
    addRecording,
    deleteRecording,
  }
})
