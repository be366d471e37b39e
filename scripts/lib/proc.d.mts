import type { ChildProcess, SpawnOptions } from 'node:child_process'
export function log(tag: string, message: string): void
export function run(command: string, args: string[], options?: SpawnOptions): Promise<number>
export function runOrThrow(command: string, args: string[], options?: SpawnOptions): Promise<void>
export function startService(
  tag: string,
  command: string,
  args: string[],
  options?: SpawnOptions,
): ChildProcess
export function stopService(child: ChildProcess | undefined, graceMs?: number): Promise<void>
export function freePort(): Promise<number>
export function runCaptured(
  command: string,
  args: string[],
  options?: SpawnOptions,
): Promise<{ code: number; output: string }>
