// The signed-in teacher's studio roster.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import { listStudents, type StudioStudent } from '../api/studio'
import { ApiError } from '../api/http'

export const useStudioStore = defineStore('studio', () => {
  const students = ref<StudioStudent[]>([])
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)

  async function loadStudents() {
    isLoading.value = true
    error.value = null
    try {
      students.value = (await listStudents()).students
    } catch (e) {
      error.value = e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))
    } finally {
      isLoading.value = false
    }
  }

  return { students, isLoading, error, loadStudents }
})
