// The teacher's studio: studios, invitations, the paged roster and one student's page.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as studioApi from '../api/studio'
import type { Assignment } from '../api/plans'
import { ApiError } from '../api/http'

const asApiError = (e: unknown) =>
  e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))

export const useStudioStore = defineStore('studio', () => {
  const students = ref<studioApi.StudioStudent[]>([])
  const studios = ref<studioApi.Studio[]>([])
  const invitations = ref<studioApi.Invitation[]>([])
  const roster = ref<studioApi.RosterRow[]>([])
  const rosterTotal = ref(0)
  const student = ref<studioApi.RosterRow | null>(null)
  const studentAssignments = ref<Assignment[]>([])
  const memberships = ref<studioApi.Membership[]>([])
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)

  /** Loads data; a failure is kept in `error` for the view to show. */
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

  const loadStudents = () =>
    load(async () => void (students.value = (await studioApi.listStudents()).students))
  const loadStudios = () =>
    load(async () => void (studios.value = (await studioApi.listStudios()).studios))
  const loadInvitations = () =>
    load(async () => void (invitations.value = (await studioApi.listInvitations()).invitations))
  const loadRoster = (query: studioApi.RosterQuery) =>
    load(async () => {
      const page = await studioApi.fetchRoster(query)
      roster.value = page.items
      rosterTotal.value = page.total
    })
  const loadStudent = (id: string) =>
    load(async () => {
      const [row, plans] = await Promise.all([
        studioApi.fetchStudent(id),
        studioApi.fetchStudentAssignments(id),
      ])
      student.value = row.student
      studentAssignments.value = plans.assignments
    })

  const loadMemberships = () =>
    load(async () => void (memberships.value = (await studioApi.listMemberships()).memberships))

  // Actions below throw on failure, so the form or dialog that called them can show the fields.
  async function addStudio(name: string) {
    studios.value = [...studios.value, (await studioApi.createStudio(name)).studio]
  }
  async function renameStudio(id: string, name: string) {
    const { studio } = await studioApi.renameStudio(id, name)
    studios.value = studios.value.map((s) => (s.id === id ? studio : s))
  }
  async function deleteStudio(id: string) {
    await studioApi.deleteStudio(id)
    studios.value = studios.value.filter((s) => s.id !== id)
  }
  async function inviteStudent(studioId: string, email: string) {
    const result = await studioApi.invite(studioId, email)
    invitations.value = [
      result.invitation,
      ...invitations.value.filter((i) => i.id !== result.invitation.id),
    ]
    void loadStudios()
    return result
  }
  async function resendInvitation(id: string) {
    const { invitation } = await studioApi.resendInvitation(id)
    invitations.value = invitations.value.map((i) => (i.id === id ? invitation : i))
  }
  async function revokeInvitation(id: string) {
    await studioApi.revokeInvitation(id)
    invitations.value = invitations.value.filter((i) => i.id !== id)
    void loadStudios()
  }
  async function removeStudent(studioId: string, studentId: string) {
    await studioApi.removeStudent(studioId, studentId)
    roster.value = roster.value.filter((r) => r.id !== studentId || r.studios.length > 1)
  }

  async function leaveStudio(studioId: string) {
    await studioApi.leaveStudio(studioId)
    memberships.value = memberships.value.filter((m) => m.studioId !== studioId)
  }

  return {
    students,
    studios,
    invitations,
    roster,
    rosterTotal,
    student,
    studentAssignments,
    memberships,
    isLoading,
    error,
    loadStudents,
    loadStudios,
    loadInvitations,
    loadRoster,
    loadStudent,
    loadMemberships,
    addStudio,
    renameStudio,
    deleteStudio,
    inviteStudent,
    resendInvitation,
    revokeInvitation,
    removeStudent,
    leaveStudio,
  }
})
