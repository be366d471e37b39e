// The project's import graph, read from the source text: for every file under src, server, db and
// scripts, the project files it imports (resolved) and the packages it imports.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')
const FOLDERS = ['src', 'server', 'db', 'scripts']
const SOURCE = /\.(ts|mts|mjs|vue)$/
const EXTENSIONS = ['', '.ts', '.vue', '.mjs', '.mts', '/index.ts']

export interface SourceFile {
  /** Repository path with forward slashes ("server/plans/plans-service.ts"). */
  file: string
  /** Project files it imports, as repository paths. */
  imports: string[]
  /** Packages it imports ("zod", "vue"). */
  packages: string[]
}

function walk(dir: string): string[] {
  return readdirSync(path.join(ROOT, dir)).flatMap((name) => {
    const rel = `${dir}/${name}`
    if (name === 'node_modules' || name.startsWith('.')) return []
    if (statSync(path.join(ROOT, rel)).isDirectory()) return walk(rel)
    const test = /\.(test|bench)\.ts$/.test(name) // tests are left out
    return SOURCE.test(name) && !test && !name.endsWith('.d.mts') ? [rel] : []
  })
}

// Comments may quote import statements; only the code counts.
const code = (text: string) => text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/^\s*\/\/.*$/gm, '')

const SPECIFIERS = [
  /\b(?:import|export)\s[^'"`;]*?\bfrom\s*['"]([^'"]+)['"]/g,
  /\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g,
  /^\s*import\s+['"]([^'"]+)['"]/gm,
]

export function specifiersOf(text: string): string[] {
  const body = code(text)
  return SPECIFIERS.flatMap((pattern) => [...body.matchAll(pattern)].map((m) => m[1] as string))
}

function resolve(from: string, specifier: string): string | null {
  const bare = specifier.replace(/\?.*$/, '') // Vite's query suffixes (?worker&url, ?raw)
  const base = bare.startsWith('@/')
    ? path.join('src', bare.slice(2))
    : path.join(path.dirname(from), bare)
  for (const ext of EXTENSIONS) {
    const candidate = `${base}${ext}`
    if (existsSync(path.join(ROOT, candidate)) && statSync(path.join(ROOT, candidate)).isFile())
      return candidate.split(path.sep).join('/')
  }
  throw new Error(`${from}: cannot resolve '${specifier}'`)
}

/** Every source file of the project with what it imports. */
export function importGraph(): Map<string, SourceFile> {
  const graph = new Map<string, SourceFile>()
  for (const file of FOLDERS.flatMap(walk)) {
    const specifiers = specifiersOf(readFileSync(path.join(ROOT, file), 'utf8'))
    const local = specifiers.filter((s) => s.startsWith('.') || s.startsWith('@/'))
    graph.set(file, {
      file,
      imports: [...new Set(local.map((s) => resolve(file, s)).filter((f) => f !== null))],
      packages: [...new Set(specifiers.filter((s) => !local.includes(s)))],
    })
  }
  return graph
}

/** The files a file reaches through its imports, itself excluded. */
export function reachable(graph: Map<string, SourceFile>, start: string): Set<string> {
  const seen = new Set<string>()
  const stack = [...(graph.get(start)?.imports ?? [])]
  while (stack.length) {
    const next = stack.pop() as string
    if (seen.has(next)) continue
    seen.add(next)
    stack.push(...(graph.get(next)?.imports ?? []))
  }
  return seen
}

/** The cycles of a directed graph (its strongly connected parts with more than one node). */
export function cyclesOf(edges: Map<string, Set<string>>): string[][] {
  const index = new Map<string, number>()
  const low = new Map<string, number>()
  const stack: string[] = []
  const onStack = new Set<string>()
  const cycles: string[][] = []
  let counter = 0
  const visit = (node: string) => {
    index.set(node, counter)
    low.set(node, counter++)
    stack.push(node)
    onStack.add(node)
    for (const next of edges.get(node) ?? []) {
      if (!index.has(next)) visit(next)
      if (onStack.has(next)) low.set(node, Math.min(low.get(node)!, low.get(next)!))
    }
    if (low.get(node) !== index.get(node)) return
    const part: string[] = []
    for (let top = ''; top !== node;) {
      top = stack.pop() as string
      onStack.delete(top)
      part.push(top)
    }
    if (part.length > 1) cycles.push(part.sort())
  }
  for (const node of edges.keys()) if (!index.has(node)) visit(node)
  return cycles
}
