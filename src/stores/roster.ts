// A teacher's roster (paged), the students list, and one student's page (row and plans).
import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Assignment } from '../api/plans'
import * as rosterApi from '../api/roster'
import { removeStudent } from '../api/studios'
import { useLoadState } from './load-state'

export const useRosterStore = defineStore('roster', () => {
  const { isLoading, error, load } = useLoadState()
  const students = ref<rosterApi.StudioStudent[]>([])
  const roster = ref<rosterApi.RosterRow[]>([])
  const rosterTotal = ref(0)
  const student = ref<rosterApi.RosterRow | null>(null)
  const studentAssignments = ref<Assignment[]>([])

  return {
    ...{ students, roster, rosterTotal, student, studentAssignments, isLoading, error },
    loadStudents: () =>
      load(async () => void (students.value = (await rosterApi.listStudents()).students)),
    loadRoster: (query: rosterApi.RosterQuery) =>
      load(async () => {
        const page = await rosterApi.fetchRoster(query)
        roster.value = page.items
        rosterTotal.value = page.total
      }),
    loadStudent: (id: string) =>
      load(async () => {
        const [row, plans] = await Promise.all([
          rosterApi.fetchStudent(id),
          rosterApi.fetchStudentAssignments(id),
        ])
        student.value = row.student
        studentAssignments.value = plans.assignments
      }),
    /** Takes a student out of one studio (throws on failure, for the menu to show). */
    async removeStudent(studioId: string, studentId: string) {
      await removeStudent(studioId, studentId)
      roster.value = roster.value.filter((r) => r.id !== studentId || r.studios.length > 1)
    },
  }
})
