// The mail log admins read (every message the app sent, as the local sink captured it).
export interface MailSummary {
  id: number
  sender: string
  recipients: string[]
  subject: string
  receivedAt: string
}

export interface MailMessage extends MailSummary {
  text: string
  html: string | null
}
