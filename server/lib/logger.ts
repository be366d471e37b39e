// pino logger; secrets (passwords, tokens, cookies) are redacted wherever they appear.
import { pino, type DestinationStream, type Logger } from 'pino'

const REDACT = [
  'req.headers.cookie',
  'req.headers.authorization',
  'res.headers["set-cookie"]',
  '*.password',
  '*.currentPassword',
  '*.newPassword',
  '*.token',
  '*.passwordHash',
]

/** Creates the process logger at the configured level. */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  return pino({ level, redact: { paths: REDACT, censor: '[redacted]' } }, destination)
}
