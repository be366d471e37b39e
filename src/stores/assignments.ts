// Assigned plans as the student sees them, with each plan's comment thread and the recordings of
// its items (the teacher's student page shares the threads and recordings).
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as assignmentsApi from '../api/assignments'
import * as plansApi from '../api/plans'
import * as recordingsApi from '../api/recordings'
import { sharedWhileRunning, useLoadState } from './load-state'

type Threads = Record<string, assignmentsApi.PlanComment[]>
type Summary = assignmentsApi.RecordingSummary

/** The thread as loaded, keeping comments posted while it loaded (the load may answer last). */
function withPostedMeanwhile(
  loaded: assignmentsApi.PlanComment[],
  current: assignmentsApi.PlanComment[],
) {
  const ids = new Set(loaded.map((c) => c.id))
  return [...loaded, ...current.filter((c) => !ids.has(c.id))].sort((a, b) =>
    a.createdAt.localeCompare(b.createdAt),
  )
}

type UpdateItem = (
  itemId: string,
  change: (item: plansApi.AssignedItem) => plansApi.AssignedItem,
) => void

/**
 * Adding, renaming and deleting an item's takes (the student's) and references (the teacher's); each
 * answers what changed, for lists kept elsewhere (the teacher's student page).
 */
const takeActions = (updateItem: UpdateItem) => ({
  async addRecording(id: string, itemId: string, take: recordingsApi.TakeUpload) {
    const { recording } = await assignmentsApi.uploadRecording(id, itemId, take)
    updateItem(itemId, (item) => ({ ...item, recordings: [recording, ...item.recordings] }))
    return recording
  },
  /** The teacher's reference take on an item: every student assigned the plan hears it. */
  async addReference(itemId: string, take: recordingsApi.TakeUpload) {
    const { recording } = await recordingsApi.uploadReference(take, { planItemId: itemId })
    updateItem(itemId, (item) => ({ ...item, references: [recording, ...item.references] }))
    return recording
  },
  async renameRecording(itemId: string, recordingId: string, title: string) {
    const { recording } = await recordingsApi.patchRecording(recordingId, { title })
    const retitled = (list: Summary[]) =>
      list.map((r) => (r.id === recordingId ? { ...r, title: recording.title } : r))
    updateItem(itemId, (item) => ({
      ...item,
      recordings: retitled(item.recordings),
      references: retitled(item.references),
    }))
    return recording
  },
  async deleteReference(itemId: string, recordingId: string) {
    await recordingsApi.deleteRecording(recordingId)
    updateItem(itemId, (item) => ({
      ...item,
      references: item.references.filter((r) => r.id !== recordingId),
    }))
  },
})

export const useAssignmentsStore = defineStore('assignments', () => {
  const { isLoading, error, load } = useLoadState()
  const assigned = ref<plansApi.Assignment[]>([])
  const threads = ref<Threads>({})
  const setThread = (
    id: string,
    change: (thread: assignmentsApi.PlanComment[]) => Threads[string],
  ) => (threads.value = { ...threads.value, [id]: change(threads.value[id] ?? []) })

  /** Changes one item of the assigned plans in place (after an upload or a delete). */
  function updateItem(
    itemId: string,
    change: (item: plansApi.AssignedItem) => plansApi.AssignedItem,
  ) {
    assigned.value = assigned.value.map((a) => ({
      ...a,
      items: a.items.map((i) => (i.id === itemId ? change(i) : i)),
    }))
  }

  return {
    assigned,
    threads,
    isLoading,
    error,
    /** Loads the student's plans; callers while a load is under way share it. */
    loadAssigned: sharedWhileRunning(() =>
      load(async () => void (assigned.value = (await plansApi.fetchAssigned()).assignments)),
    ),
    loadThread: (id: string) =>
      load(async () => {
        const { comments } = await assignmentsApi.listComments(id)
        setThread(id, (thread) => withPostedMeanwhile(comments, thread))
      }),
    // Actions below throw on failure, so the form that called them can show it.
    async addComment(id: string, body: string) {
      const { comment } = await assignmentsApi.postComment(id, body)
      setThread(id, (thread) => [...thread, comment])
    },
    async deleteComment(id: string, commentId: string) {
      await assignmentsApi.deleteComment(id, commentId)
      setThread(id, (thread) => thread.filter((c) => c.id !== commentId))
    },
    ...takeActions(updateItem),
    async deleteRecording(id: string, itemId: string, recordingId: string) {
      await assignmentsApi.deleteRecording(id, recordingId)
      updateItem(itemId, (item) => ({
        ...item,
        recordings: item.recordings.filter((r) => r.id !== recordingId),
      }))
    },
  }
})
