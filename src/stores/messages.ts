// Messages: the teacher's sent ones with who has read them, or the student's inbox and its unread
// count.
import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import * as messagesApi from '../api/messages'
import { useLoadState } from './load-state'

export const useMessagesStore = defineStore('messages', () => {
  const { isLoading, error, load, track } = useLoadState()
  const sent = ref<messagesApi.SentMessage[]>([])
  const received = ref<messagesApi.ReceivedMessage[]>([])
  const unread = computed(() => received.value.filter((m) => !m.readAt).length)

  return {
    ...{ sent, received, unread, isLoading, error },
    loadSent: () =>
      load(async () => void (sent.value = (await messagesApi.listSentMessages()).messages)),
    loadReceived: () =>
      load(async () => void (received.value = (await messagesApi.listReceivedMessages()).messages)),
    send: (input: messagesApi.MessageCreateInput) =>
      track(async () => {
        sent.value = [(await messagesApi.sendMessage(input)).message, ...sent.value]
      }),
    markRead: (id: string) =>
      track(async () => {
        const { message } = await messagesApi.markMessageRead(id)
        received.value = received.value.map((m) => (m.id === id ? message : m))
      }),
    remove: (id: string) =>
      track(async () => {
        await messagesApi.deleteMessage(id)
        sent.value = sent.value.filter((m) => m.id !== id)
      }),
  }
})
