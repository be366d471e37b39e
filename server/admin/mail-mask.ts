// The admin mail log hides links that carry a secret (reset and invitation tokens): it shows that
// a link was sent and where it leads, never the link itself. Developers read raw mail locally with
// `npm run mail:show`; tests read the captured_mail table.
import type { MailMessage } from './admin-schema'

const LINK = /https?:\/\/[^\s"'<>]+/g
// A path segment this long and random-looking is a token even without a query string.
const OPAQUE_SEGMENT = /\/[A-Za-z0-9_-]{20,}(\/|$)/

/** Replaces every link with a query, fragment or token-like segment by "[link to /path (hidden)]". */
export function maskLinks(text: string): string {
  return text.replace(LINK, (raw) => {
    let url: URL
    try {
      url = new URL(raw)
    } catch {
      return '[link (hidden)]'
    }
    if (!url.search && !url.hash && !OPAQUE_SEGMENT.test(url.pathname)) return raw
    const path = url.pathname.replace(OPAQUE_SEGMENT, '/…$1')
    return `[link to ${path} (hidden)]`
  })
}

export const maskMessage = (message: MailMessage): MailMessage => ({
  ...message,
  text: maskLinks(message.text),
  html: message.html === null ? null : maskLinks(message.html),
})
