// /api/messages: a teacher's messages to students (with read states); a student's inbox.
import type { MessageCreateInput, ReceivedMessage, SentMessage } from '../contract/messages'
import { http } from './http'

export type { MessageCreateInput, ReceivedMessage, SentMessage }

export const listSentMessages = () => http.get<{ messages: SentMessage[] }>('/messages')
export const listReceivedMessages = () => http.get<{ messages: ReceivedMessage[] }>('/messages')
export const sendMessage = (input: MessageCreateInput) =>
  http.post<{ message: SentMessage }>('/messages', input)
export const markMessageRead = (id: string) =>
  http.post<{ message: ReceivedMessage }>(`/messages/${id}/read`)
export const deleteMessage = (id: string) => http.delete<void>(`/messages/${id}`)
