// Worker thread (run by piscina): bcrypt's CPU work happens here, never on the event loop.
import bcrypt from 'bcryptjs'

export type PasswordTask =
  { op: 'hash'; password: string; cost: number } | { op: 'verify'; password: string; hash: string }

export default function passwordTask(task: PasswordTask): string | boolean {
  return task.op === 'hash'
    ? bcrypt.hashSync(task.password, task.cost)
    : bcrypt.compareSync(task.password, task.hash)
}
