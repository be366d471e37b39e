// The loading flag and error every store keeps beside its data, and the two ways work records them:
// a load keeps its failure for the view to show; an action also throws it to the form that called.
import { ref } from 'vue'
import { ApiError } from '../api/http'

export const asApiError = (e: unknown) =>
  e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))

export function useLoadState() {
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)

  async function run<T>(work: () => Promise<T>, rethrow: boolean): Promise<T | undefined> {
    isLoading.value = true
    error.value = null
    try {
      return await work()
    } catch (e) {
      error.value = asApiError(e)
      if (rethrow) throw error.value
      return undefined
    } finally {
      isLoading.value = false
    }
  }

  return {
    isLoading,
    error,
    /** Loads data; a failure is kept in `error` for the view to show. */
    load: (work: () => Promise<unknown>) => run(work, false).then(() => undefined),
    /** Runs an action; a failure is kept in `error` and thrown to the caller. */
    track: <T>(work: () => Promise<T>) => run(work, true) as Promise<T>,
  }
}

/** A load that, while under way, is shared by every caller instead of being asked for again
 * (`force` starts a new one); `forget()` drops the one under way (on sign-out). */
export function sharedWhileRunning(work: (force: boolean) => Promise<void>) {
  let pending: Promise<void> | null = null
  function load(force = false): Promise<void> {
    if (pending && !force) return pending
    const run = work(force)
    const settle = () => void (pending === run && (pending = null))
    run.then(settle, settle)
    pending = run
    return run
  }
  return Object.assign(load, { forget: () => void (pending = null) })
}
