// Lessons of one student (the teacher's page) or of the signed-in student, with "since the last lesson".
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as lessonsApi from '../api/lessons'
import type { LessonCreateInput } from '../api/lessons'
import type { LessonNoteInput, LessonUpdateInput } from '../contract/lessons'
import { useLoadState } from './load-state'

export const useLessonsStore = defineStore('lessons', () => {
  const { isLoading, error, load, track } = useLoadState()
  const lessons = ref<lessonsApi.Lesson[]>([])
  const since = ref<lessonsApi.SinceLastLesson | null>(null)
  const replace = (lesson: lessonsApi.Lesson) =>
    (lessons.value = lessons.value.map((l) => (l.id === lesson.id ? lesson : l)))

  return {
    ...{ lessons, since, isLoading, error },
    load: (studentId?: string) =>
      load(async () => {
        const [list, figures] = await Promise.all([
          lessonsApi.listLessons(studentId),
          studentId ? lessonsApi.sinceLastLesson(studentId) : Promise.resolve(null),
        ])
        lessons.value = list.lessons
        since.value = figures?.since ?? null
      }),
    schedule: (input: LessonCreateInput) =>
      track(async () => {
        const added = (await lessonsApi.scheduleLessons(input)).lessons
        lessons.value = [...lessons.value, ...added].sort((a, b) =>
          a.startsAt.localeCompare(b.startsAt),
        )
      }),
    change: (id: string, change: LessonUpdateInput) =>
      track(async () => void replace((await lessonsApi.updateLesson(id, change)).lesson)),
    remove: (id: string) =>
      track(async () => {
        await lessonsApi.deleteLesson(id)
        lessons.value = lessons.value.filter((l) => l.id !== id)
      }),
    addNote: (id: string, note: LessonNoteInput) =>
      track(async () => void replace((await lessonsApi.addLessonNote(id, note)).lesson)),
  }
})
