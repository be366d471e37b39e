// Where code may reach, checked on the resolved import graph (ESLint says the same per import, as
// you type): the client never imports server/; the server takes from src/ only the theory core and
// the contract and never reaches scripts/; db/ imports no server code; the contract is pure;
// migrations import nothing of the project; server feature folders import each other without a circle.
import { describe, expect, it } from 'vitest'
import { cyclesOf, importGraph, reachable } from '../helpers/import-graph'

const graph = importGraph()
const files = [...graph.keys()]
const under = (folder: string) => (file: string) => file.startsWith(`${folder}/`)
const offending = (from: string[], bad: (target: string) => boolean, transitive = false) =>
  from.flatMap((file) =>
    [...(transitive ? reachable(graph, file) : graph.get(file)!.imports)]
      .filter(bad)
      .map((target) => `${file} → ${target}`),
  )

describe('boundaries between client, contract, server, db and scripts', () => {
  it('reads the whole tree (a sanity check of the reader itself)', () => {
    expect(files.filter(under('src')).length).toBeGreaterThan(100)
    expect(files.filter(under('server')).length).toBeGreaterThan(50)
    expect(graph.get('server/app.ts')!.imports).toContain('server/health/health-routes.ts')
    expect(graph.get('src/router/routes.ts')!.imports).toContain('src/drills/registry.ts')
  })

  it('no file under src/ imports anything under server/ (types included)', () => {
    expect(offending(files.filter(under('src')), under('server'))).toEqual([])
  })

  it('the server takes from src/ only src/theory and src/contract, even through other files', () => {
    const allowed = (t: string) => under('src/theory')(t) || under('src/contract')(t)
    const bad = (t: string) => under('src')(t) && !allowed(t)
    expect(offending(files.filter(under('server')), bad, true)).toEqual([])
  })

  it('nothing the server loads is under scripts/', () => {
    expect(offending(files.filter(under('server')), under('scripts'), true)).toEqual([])
  })

  it('db/ imports no server code, even through other files', () => {
    expect(offending(files.filter(under('db')), under('server'), true)).toEqual([])
  })

  it('the contract imports only zod, the theory core and other contract modules', () => {
    const contract = files.filter(under('src/contract'))
    const local = (t: string) => !under('src/contract')(t) && !under('src/theory')(t)
    expect(offending(contract, local)).toEqual([])
    const packages = contract.flatMap((f) => graph.get(f)!.packages.filter((p) => p !== 'zod'))
    expect(packages).toEqual([])
  })

  it('migrations import no other migration and no project file', () => {
    expect(offending(files.filter(under('db/migrations')), () => true)).toEqual([])
  })
})

describe('server feature folders', () => {
  const folderOf = (file: string) => file.split('/')[1] as string
  const edges = new Map<string, Set<string>>()
  for (const file of files.filter((f) => under('server')(f) && f.split('/').length > 2)) {
    const targets = graph
      .get(file)!
      .imports.filter((t) => under('server')(t) && t.split('/').length > 2)
    const from = folderOf(file)
    const set = edges.get(from) ?? new Set<string>()
    for (const t of targets) if (folderOf(t) !== from) set.add(folderOf(t))
    edges.set(from, set)
  }

  it('import each other without a circle (a folder may use another, never back)', () => {
    expect(cyclesOf(edges)).toEqual([])
  })

  it('the cycle finder finds a circle when there is one (so the check above can fail)', () => {
    const circle = new Map([
      ['plans', new Set(['studios'])],
      ['studios', new Set(['plans'])],
      ['users', new Set<string>()],
    ])
    expect(cyclesOf(circle)).toEqual([['plans', 'studios']])
  })
})
