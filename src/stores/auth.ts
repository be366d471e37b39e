// Who is signed in: loads the session once, signs in and out, and knows each role's home page.
import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import * as authApi from '../api/auth'
import { ApiError } from '../api/http'
import { useLoadState } from './load-state'
import type { PublicUser } from '../api/auth'
import type { Role } from '../contract/users'

const HOME_BY_ROLE: Record<Role, string> = {
  student: 'practice',
  teacher: 'studio',
  admin: 'admin-users',
}

export const useAuthStore = defineStore('auth', () => {
  const user = ref<PublicUser | null>(null)
  const loaded = ref(false)
  const { isLoading, error, track } = useLoadState()

  const isSignedIn = computed(() => user.value !== null)
  const homeRoute = computed(() => (user.value ? HOME_BY_ROLE[user.value.role] : 'sign-in'))

  /** Loads the current session once (a 401 simply means nobody is signed in). */
  async function loadSession() {
    if (loaded.value) return
    try {
      user.value = (await authApi.fetchMe()).user
    } catch (e) {
      if (!(e instanceof ApiError && e.status === 401)) throw e
      user.value = null
    } finally {
      loaded.value = true
    }
  }

  const signIn = (email: string, password: string) =>
    track(async () => {
      user.value = (await authApi.login(email, password)).user
    })

  const register = (body: authApi.RegisterBody) =>
    track(async () => {
      user.value = (await authApi.register(body)).user
    })

  const signOut = () =>
    track(async () => {
      await authApi.logout()
      user.value = null
    })

  /** Ends every session of this account (all devices, this one included). */
  const signOutEverywhere = () =>
    track(async () => {
      await authApi.logoutEverywhere()
      user.value = null
    })

  /** Forgets the user locally (the server already ended the session). */
  function expire() {
    user.value = null
    loaded.value = true
  }

  const hasRole = (roles?: Role[]) =>
    !roles || (user.value !== null && roles.includes(user.value.role))

  return {
    user,
    loaded,
    isLoading,
    error,
    isSignedIn,
    homeRoute,
    loadSession,
    signIn,
    register,
    signOut,
    signOutEverywhere,
    expire,
    hasRole,
  }
})
