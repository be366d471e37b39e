/// <reference types="vite/client" />
import 'vue-router'
import type { Role } from '../server/users/users-schema'

declare module 'vue-router' {
  interface RouteMeta {
    /** Roles allowed on this route; absent = public. */
    roles?: Role[]
    /** Pages shown without the signed-in navigation (sign-in, register …). */
    layout?: 'public' | 'app'
    title?: string
  }
}
