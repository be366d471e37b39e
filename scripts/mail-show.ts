// npm run mail:show [-- --to <address>] [--last <n>]: prints mail the local SMTP sink captured, raw
// (links and tokens included), for a developer on their own machine. The admin mail log hides them.
import { parseArgs } from 'node:util'
import { recentMail } from '../server/admin/mail-log-repository'
import { createDb } from '../server/lib/db'
import { startCluster, stopCluster } from './db.mjs'
import { databaseUrl } from './lib/paths.mjs'

const { values } = parseArgs({
  options: { to: { type: 'string' }, last: { type: 'string' } },
  strict: true,
})
// `npm run mail:show --to x` (without `--`) reaches us as npm_config_to; accept both forms.
const to = values.to ?? process.env.npm_config_to
const last = Number(values.last ?? process.env.npm_config_last ?? 5)
if (!Number.isInteger(last) || last < 1) throw new Error('--last takes a whole number ≥ 1')

// The local cluster is started when needed (and stopped again if this script started it).
const startedCluster = process.env.DATABASE_URL ? false : await startCluster()
const db = createDb(databaseUrl())
try {
  const messages = await recentMail(db, { to: to?.trim().toLowerCase(), last })
  if (!messages.length) console.log(to ? `No captured mail to ${to}.` : 'No captured mail yet.')
  for (const m of messages) {
    console.log(`#${m.id}  ${m.receivedAt}  to ${m.recipients.join(', ')}  from ${m.sender}`)
    console.log(`Subject: ${m.subject}\n\n${m.text.trimEnd()}\n${'─'.repeat(72)}`)
  }
} finally {
  await db.destroy()
  if (startedCluster) stopCluster()
}
