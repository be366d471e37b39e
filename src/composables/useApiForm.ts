// Submitting a form to the API: busy flag, the server's message, and per-field errors.
import { ref } from 'vue'
import { ApiError, type FieldErrors } from '../api/http'

export function useApiForm() {
  const busy = ref(false)
  const message = ref('')
  const fields = ref<FieldErrors>({})

  async function submit(work: () => Promise<void>) {
    busy.value = true
    message.value = ''
    fields.value = {}
    try {
      await work()
    } catch (e) {
      if (!(e instanceof ApiError)) throw e
      message.value = e.message
      fields.value = e.fields
    } finally {
      busy.value = false
    }
  }

  const fieldError = (name: string) => fields.value[name] ?? []
  return { busy, message, fields, submit, fieldError }
}
