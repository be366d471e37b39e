// Outgoing e-mail through nodemailer; locally it goes to the SMTP sink on 127.0.0.1.
import nodemailer from 'nodemailer'
import type { Config } from '../config'

export interface OutgoingMail {
  to: string
  subject: string
  text: string
  html?: string
  attachments?: { filename: string; content: Buffer; contentType?: string }[]
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>
  close(): void
}

/** Creates the SMTP mailer for the configured host and port. */
export function createMailer(config: Pick<Config, 'smtpHost' | 'smtpPort' | 'mailFrom'>): Mailer {
  const local = config.smtpHost === '127.0.0.1' || config.smtpHost === 'localhost'
  const transport = nodemailer.createTransport({
    host: config.smtpHost,
    port: config.smtpPort,
    secure: false,
    ignoreTLS: local,
    pool: false,
  })
  return {
    async send(mail) {
      await transport.sendMail({ from: config.mailFrom, ...mail })
    },
    close: () => transport.close(),
  }
}
