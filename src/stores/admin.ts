// Admin data: the user list and the captured-mail log, each paged on the server.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as adminApi from '../api/admin'
import { useLoadState } from './load-state'
import type { AdminUser, UserChange } from '../contract/users'

export const useAdminStore = defineStore('admin', () => {
  const users = ref<AdminUser[]>([])
  const userTotal = ref(0)
  const mail = ref<adminApi.MailSummary[]>([])
  const mailTotal = ref(0)
  const openMessage = ref<adminApi.MailMessage | null>(null)
  const { isLoading, error, load: track } = useLoadState()

  const loadUsers = (query: adminApi.PageQuery) =>
    track(async () => {
      const page = await adminApi.listUsers(query)
      users.value = page.items
      userTotal.value = page.total
    })

  /** Applies a confirmed change (role, or disabled); the server ends that account's sessions. */
  const changeUser = (id: string, change: UserChange) =>
    track(async () => {
      const { user } = await adminApi.changeUser(id, change)
      users.value = users.value.map((u) => (u.id === id ? user : u))
    })

  const loadMail = (query: adminApi.PageQuery) =>
    track(async () => {
      const page = await adminApi.listMail(query)
      mail.value = page.items
      mailTotal.value = page.total
    })

  const openMail = (id: number) =>
    track(async () => {
      openMessage.value = (await adminApi.fetchMail(id)).message
    })

  /** Sends every teacher's weekly digest now; resolves to how many went out (errors are thrown to the caller). */
  const sendDigests = async () => (await adminApi.sendDigestsNow()).sent

  return {
    users,
    userTotal,
    mail,
    mailTotal,
    openMessage,
    isLoading,
    error,
    loadUsers,
    changeUser,
    loadMail,
    openMail,
    sendDigests,
  }
})
