// The addresses typed into the invite dialog: separated by commas, semicolons, spaces or lines.
import { email, type Rule } from '@/composables/useFormRules'
import { INVITE_BATCH_MAX, type InvitationBatchResult } from '@/contract/studios'

/** Each address once, in the order typed. */
export const splitAddresses = (text: string) => [
  ...new Set(
    text
      .split(/[\s,;]+/)
      .map((a) => a.trim())
      .filter(Boolean),
  ),
]

/** Every address must look like one; at most INVITE_BATCH_MAX at once. */
export const addressesRule: Rule = (text) => {
  const list = splitAddresses(text)
  if (list.length > INVITE_BATCH_MAX) return `At most ${INVITE_BATCH_MAX} addresses at once.`
  const wrong = list.find((a) => email(a) !== true)
  return wrong ? `"${wrong}" is not an e-mail address.` : true
}

/** "Invitations sent to 2 addresses; 1 was already invited (a new link is on its way); …". */
export function batchSummary(results: InvitationBatchResult[]): string {
  const count = (o: InvitationBatchResult['outcome']) => results.filter((r) => r.outcome === o)
  const [sent, resent, members] = [count('sent'), count('resent'), count('member')]
  const s = (n: number) => (n === 1 ? '' : 'es')
  return [
    sent.length ? `Invitations sent to ${sent.length} address${s(sent.length)}.` : '',
    resent.length
      ? `Already invited, new link sent: ${resent.map((r) => r.email).join(', ')}.`
      : '',
    members.length ? `Already in the studio: ${members.map((r) => r.email).join(', ')}.` : '',
  ]
    .filter(Boolean)
    .join(' ')
}
