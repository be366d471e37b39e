// A teacher's studios and invitations; a student's memberships.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as invitationsApi from '../api/invitations'
import * as studiosApi from '../api/studios'
import { useLoadState } from './load-state'

export const useStudioStore = defineStore('studio', () => {
  const { isLoading, error, load } = useLoadState()
  const studios = ref<studiosApi.Studio[]>([])
  const invitations = ref<invitationsApi.Invitation[]>([])
  const memberships = ref<studiosApi.Membership[]>([])
  const loadStudios = () =>
    load(async () => void (studios.value = (await studiosApi.listStudios()).studios))
  const keepInvitation = (invitation: invitationsApi.Invitation) =>
    (invitations.value = [invitation, ...invitations.value.filter((i) => i.id !== invitation.id)])

  // Actions throw on failure, so the form or dialog that called them can show the fields.
  return {
    ...{ studios, invitations, memberships, isLoading, error, loadStudios },
    loadInvitations: () =>
      load(async () => {
        invitations.value = (await invitationsApi.listInvitations()).invitations
      }),
    loadMemberships: () =>
      load(async () => void (memberships.value = (await studiosApi.listMemberships()).memberships)),
    async addStudio(name: string) {
      studios.value = [...studios.value, (await studiosApi.createStudio(name)).studio]
    },
    async renameStudio(id: string, name: string) {
      const { studio } = await studiosApi.renameStudio(id, name)
      studios.value = studios.value.map((s) => (s.id === id ? studio : s))
    },
    async deleteStudio(id: string) {
      await studiosApi.deleteStudio(id)
      studios.value = studios.value.filter((s) => s.id !== id)
    },
    async inviteStudent(studioId: string, email: string, message?: string) {
      const result = await invitationsApi.invite(studioId, email, message)
      keepInvitation(result.invitation)
      void loadStudios()
      return result
    },
    async inviteStudents(studioId: string, emails: string[], message?: string) {
      const { results } = await invitationsApi.inviteMany(studioId, emails, message)
      for (const r of results) if (r.invitation) keepInvitation(r.invitation)
      void loadStudios()
      return results
    },
    async resendInvitation(id: string) {
      const { invitation } = await invitationsApi.resendInvitation(id)
      invitations.value = invitations.value.map((i) => (i.id === id ? invitation : i))
    },
    async revokeInvitation(id: string) {
      await invitationsApi.revokeInvitation(id)
      invitations.value = invitations.value.filter((i) => i.id !== id)
      void loadStudios()
    },
    async leaveStudio(studioId: string) {
      await studiosApi.leaveStudio(studioId)
      memberships.value = memberships.value.filter((m) => m.studioId !== studioId)
    },
  }
})
