// Request fields added by our middleware.
import type { PublicUser } from '../users/users-schema'

declare global {
  namespace Express {
    interface Request {
      user?: PublicUser
      /** The server-side session the request's cookie names (set by requireAuth). */
      sessionId?: string
    }
  }
}

export {}
