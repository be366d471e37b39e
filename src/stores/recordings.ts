// Takes outside the assigned plans (a student's free takes, the teacher's references and the takes
// shared with them), the teachers a student may share with, and the comments pinned to each take.
import { defineStore } from 'pinia'
import { ref, type Ref } from 'vue'
import * as api from '../api/recordings'
import type { PinnedCommentInput, RecordingPatch } from '../contract/recordings'
import { useLoadState } from './load-state'

type Pinned = { comments: api.PinnedComment[]; rights: api.RecordingRights }

const byMoment = (a: api.PinnedComment, b: api.PinnedComment) =>
  a.atMs - b.atMs || a.createdAt.localeCompare(b.createdAt)

type Entries = Ref<api.RecordingEntry[]>

/**
 * Pinning and unpinning comments, kept in the order of their moments, and each take's count. A
 * failure goes to the caller only: the take shows it beside its comment form, not the page again.
 */
function pinActions(pinned: Ref<Record<string, Pinned>>, entries: Entries) {
  const setPinned = (id: string, change: (p: Pinned) => Pinned) => {
    const current = pinned.value[id]
    if (current) pinned.value = { ...pinned.value, [id]: change(current) }
  }
  const count = (id: string, by: number) =>
    (entries.value = entries.value.map((e) =>
      e.id === id ? { ...e, commentCount: Math.max(0, e.commentCount + by) } : e,
    ))
  return {
    async pin(id: string, input: PinnedCommentInput) {
      const { comment } = await api.pinComment(id, input)
      setPinned(id, (p) => ({ ...p, comments: [...p.comments, comment].sort(byMoment) }))
      count(id, 1)
    },
    async unpin(id: string, commentId: string) {
      await api.unpinComment(id, commentId)
      setPinned(id, (p) => ({ ...p, comments: p.comments.filter((c) => c.id !== commentId) }))
      count(id, -1)
    },
  }
}

export const useRecordingsStore = defineStore('recordings', () => {
  const { isLoading, error, load, track } = useLoadState()
  const entries = ref<api.RecordingEntry[]>([])
  const teachers = ref<api.Person[]>([])
  const pinned = ref<Record<string, Pinned>>({})

  const replace = (entry: api.RecordingEntry) =>
    (entries.value = entries.value.map((e) => (e.id === entry.id ? entry : e)))

  return {
    entries,
    teachers,
    pinned,
    isLoading,
    error,
    load: (student?: string) =>
      load(async () => void (entries.value = (await api.listRecordings(student)).recordings)),
    loadTeachers: () =>
      load(async () => void (teachers.value = (await api.listTeachers()).teachers)),
    loadPinned: (id: string) =>
      load(async () => void (pinned.value = { ...pinned.value, [id]: await api.listPinned(id) })),
    // Actions below throw on failure, so the form that called them can show it.
    addTake: (take: api.TakeUpload, shareWith?: string) =>
      track(async () => {
        const { recording } = await api.uploadTake(take, shareWith)
        entries.value = [recording, ...entries.value]
      }),
    addReference: (take: api.TakeUpload, on: { planItemId?: string; studentId?: string }) =>
      track(async () => {
        const { recording } = await api.uploadReference(take, on)
        entries.value = [recording, ...entries.value]
        return recording
      }),
    change: (id: string, patch: RecordingPatch) =>
      track(async () => {
        const { recording } = await api.patchRecording(id, patch)
        replace(recording)
        return recording
      }),
    remove: (id: string) =>
      track(async () => {
        await api.deleteRecording(id)
        entries.value = entries.value.filter((e) => e.id !== id)
      }),
    ...pinActions(pinned, entries),
  }
})
