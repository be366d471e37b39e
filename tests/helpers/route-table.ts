// The app's own route table: every method and path Express would dispatch, read from the router
// stack (so a route added anywhere shows up here without anyone listing it by hand).
import type { Express } from 'express'

export interface RouteEntry {
  method: string
  path: string
}

interface StackLayer {
  rawPath?: unknown
  route?: { path: string; methods: Record<string, boolean> }
  handle?: { stack?: StackLayer[] }
}

function walk(stack: StackLayer[], prefix: string, into: RouteEntry[]) {
  for (const layer of stack) {
    if (layer.route) {
      const path = (prefix + layer.route.path).replace(/(.)\/$/, '$1')
      for (const method of Object.keys(layer.route.methods))
        into.push({ method: method.toUpperCase(), path })
    } else if (layer.handle?.stack) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''
      walk(layer.handle.stack, prefix + mount, into)
    }
  }
}

/** Every route of the app as "METHOD /path" entries, in mounting order, without duplicates. */
export function routeTable(app: Express): RouteEntry[] {
  const routes: RouteEntry[] = []
  walk((app as unknown as { router: { stack: StackLayer[] } }).router.stack, '', routes)
  const seen = new Set<string>()
  return routes.filter(({ method, path }) => {
    const key = `${method} ${path}`
    return !seen.has(key) && Boolean(seen.add(key))
  })
}

/** "METHOD /path", the key route tables and their rows share. */
export const routeKey = ({ method, path }: RouteEntry) => `${method} ${path}`
