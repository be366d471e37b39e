// Local SMTP sink: accepts every message on 127.0.0.1 and stores it for the admin mail log.
import { simpleParser } from 'mailparser'
import type { AddressInfo } from 'node:net'
import { SMTPServer } from 'smtp-server'
import type { Db } from '../lib/db'

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024

export interface MailSink {
  port: number
  close(): Promise<void>
}

async function readStream(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = []
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer))
  return Buffer.concat(chunks)
}

async function storeMessage(db: Db, raw: Buffer, envelopeTo: string[], envelopeFrom: string) {
  const parsed = await simpleParser(raw)
  await db('captured_mail').insert({
    message_id: parsed.messageId ?? null,
    sender: parsed.from?.text ?? envelopeFrom,
    recipients: envelopeTo,
    subject: parsed.subject ?? '',
    text_body: parsed.text ?? '',
    html_body: typeof parsed.html === 'string' ? parsed.html : null,
    size_bytes: raw.length,
  })
}

/** Starts the sink on host:port (port 0 picks a free one) writing into the given database. */
export function startMailSink(db: Db, port = 2525, host = '127.0.0.1'): Promise<MailSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const to = session.envelope.rcptTo.map((r) => r.address)
      const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : ''
      readStream(stream)
        .then((raw) => storeMessage(db, raw, to, from))
        .then(
          () => callback(),
          (error: Error) => callback(error),
        )
    },
  })
  return new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, host, () => {
      const address = server.server.address() as AddressInfo
      resolve({
        port: address.port,
        close: () => new Promise<void>((done) => server.close(() => done())),
      })
    })
  })
}
