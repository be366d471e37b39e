// Reads the mail captured by the local SMTP sink.
import type { Db } from '../lib/db'
import type { MailListQuery } from './admin-schema'
import type { MailMessage, MailSummary } from '../../src/contract/mail-log'

interface MailRow {
  id: string
  sender: string
  recipients: string[]
  subject: string
  text_body: string
  html_body: string | null
  received_at: Date
}

const toSummary = (row: MailRow): MailSummary => ({
  id: Number(row.id),
  sender: row.sender,
  recipients: row.recipients,
  subject: row.subject,
  receivedAt: row.received_at.toISOString(),
})

export async function listMail(db: Db, query: MailListQuery) {
  const base = db<MailRow>('captured_mail').modify((q) => {
    if (!query.search) return
    const like = `%${query.search.replace(/[%_\\]/g, '\\$&')}%`
    q.where((w) =>
      w.whereILike('subject', like).orWhereRaw("array_to_string(recipients, ' ') ilike ?", [like]),
    )
  })
  const [{ count }] = (await base.clone().count({ count: '*' })) as [{ count: string }]
  const rows = await base
    .clone()
    .select('id', 'sender', 'recipients', 'subject', 'received_at')
    .orderBy('id', 'desc')
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize)
  return { total: Number(count), items: rows.map(toSummary) }
}

const toMessage = (row: MailRow): MailMessage => ({
  ...toSummary(row),
  text: row.text_body,
  html: row.html_body,
})

export async function findMail(db: Db, id: number): Promise<MailMessage | null> {
  const row = await db<MailRow>('captured_mail')
    .where({ id: String(id) })
    .first()
  return row ? toMessage(row) : null
}

/** The newest `last` messages (to one address when given), oldest first, raw (for mail:show). */
export async function recentMail(
  db: Db,
  filter: { to?: string; last: number },
): Promise<MailMessage[]> {
  const rows: MailRow[] = await db('captured_mail')
    .modify((q) => {
      if (filter.to) q.whereRaw('? = any(recipients)', [filter.to])
    })
    .orderBy('id', 'desc')
    .limit(filter.last)
  return rows.reverse().map(toMessage)
}

/** Newest message sent to an address, raw (tests read links from it). */
export async function latestMailTo(db: Db, address: string): Promise<MailMessage | null> {
  const row = await db<MailRow>('captured_mail')
    .whereRaw('? = any(recipients)', [address])
    .orderBy('id', 'desc')
    .first()
  return row ? toMessage(row) : null
}
