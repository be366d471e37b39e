/// <reference types="vite/client" />
import 'vue-router'
import type { Role } from './contract/users'

declare module 'vue-router' {
  interface RouteMeta {
    /** Roles allowed on this route; absent = public. */
    roles?: Role[]
    /** Pages shown without the signed-in navigation (sign-in, register …). */
    layout?: 'public' | 'app'
    title?: string
    /** The page runs on the player's instrument: the router asks for it with the session. */
    usesInstrument?: boolean
  }
}
