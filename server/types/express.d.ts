// Request fields added by our middleware.
import type { PublicUser } from '../users/users-schema'

declare global {
  namespace Express {
    interface Request {
      user?: PublicUser
    }
  }
}

export {}
