// Child-process helpers shared by the start, dev and test scripts.
import { spawn } from 'node:child_process'
import net from 'node:net'
import { ROOT } from './paths.mjs'

/** Prints a tagged progress line. */
export function log(tag, message) {
  console.log(`[${tag}] ${message}`)
}

/** Runs a command to completion with inherited output; resolves to its exit code. */
export function run(command, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd: ROOT, stdio: 'inherit', ...options })
    child.on('error', reject)
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)))
  })
}

/** Runs a command with its output collected; resolves to { code, output }. */
export function runCaptured(command, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], ...options })
    let output = ''
    child.stdout.on('data', (chunk) => (output += chunk))
    child.stderr.on('data', (chunk) => (output += chunk))
    child.on('error', reject)
    child.on('exit', (code, signal) => resolve({ code: code ?? (signal ? 1 : 0), output }))
  })
}

/** Runs a command and rejects when it fails. */
export async function runOrThrow(command, args, options = {}) {
  const code = await run(command, args, options)
  if (code !== 0) throw new Error(`${command} ${args.join(' ')} exited with ${code}`)
}

/** Starts a long-running child; its output is prefixed so interleaved logs stay readable. */
export function startService(tag, command, args, options = {}) {
  const child = spawn(command, args, { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], ...options })
  const prefix = (stream, target) =>
    stream.on('data', (chunk) => {
      for (const line of chunk.toString().split('\n')) if (line) target.write(`[${tag}] ${line}\n`)
    })
  prefix(child.stdout, process.stdout)
  prefix(child.stderr, process.stderr)
  return child
}

/** Sends SIGTERM and waits for the child to exit (SIGKILL after a grace period). */
export function stopService(child, graceMs = 8000) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve()
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), graceMs)
    child.once('exit', () => {
      clearTimeout(timer)
      resolve()
    })
    child.kill('SIGTERM')
  })
}

/** Asks the OS for a free TCP port on loopback. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer()
    server.once('error', reject)
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address()
      server.close(() => resolve(port))
    })
  })
}
