// Answers partitioned by month: a query for one player's month reads one partition (EXPLAIN), the
// scheduler's job creates the months ahead, old answers land in attempts_before, and the player's id
// leads every unique key (the table could be distributed by student).
import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ensureMonthPartitions } from '../../server/attempts/attempts-repository'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

/** The partition name of the month `monthsOn` from now (UTC), as the SQL names it. */
function partitionOf(monthsOn: number) {
  const now = new Date()
  const at = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() + monthsOn, 1))
  return {
    name: `attempts_y${at.getUTCFullYear()}m${String(at.getUTCMonth() + 1).padStart(2, '0')}`,
    at,
  }
}

async function plan(sql: string, bindings: string[]) {
  const { rows } = await api.ctx.db.raw(`explain (costs off) ${sql}`, bindings)
  return (rows as { 'QUERY PLAN': string }[]).map((r) => r['QUERY PLAN']).join('\n')
}

describe('answers partitioned by month', () => {
  it("when one player's answers of this month are counted, then the plan reads only this month's partition", async () => {
    const { user } = await signedInAgent(api.app)
    await insertAttempts(api.ctx, user.id, null, [{ correct: true, responseMs: 900 }])
    const { name, at } = partitionOf(0)
    const text = await plan(
      'select count(*) from attempts where user_id = ? and created_at >= ? and created_at < ?',
      [user.id, at.toISOString(), partitionOf(1).at.toISOString()],
    )
    expect(text).toContain(name)
    expect(text.match(/attempts_(y\d{4}m\d{2}|before)/g)?.every((p) => p === name)).toBe(true)
    const all = await plan('select count(*) from attempts where user_id = ?', [user.id])
    expect(all).toContain('attempts_before') // without a time, every month is read
  })

  it('when the partition job runs, then the coming months exist and an old answer lands before them', async () => {
    await ensureMonthPartitions(api.ctx.db, 5)
    for (const months of [1, 3, 5]) {
      const { rows } = await api.ctx.db.raw('select to_regclass(?) as t', [
        partitionOf(months).name,
      ])
      expect(rows[0].t).toBe(partitionOf(months).name)
    }
    expect(await ensureMonthPartitions(api.ctx.db, 5)).toBe(0) // already there
    const { user } = await signedInAgent(api.app)
    await insertAttempts(api.ctx, user.id, null, [{ correct: true, responseMs: 900 }])
    const id = randomUUID()
    await api.ctx.db('attempts').insert({
      ...(await api.ctx.db('attempts').where({ user_id: user.id }).first()),
      id,
      created_at: '2003-05-01T10:00:00Z',
    })
    const row = await api.ctx.db('attempts').where({ id }).first('tableoid')
    const { rows } = await api.ctx.db.raw('select ?::regclass::text as t', [row.tableoid])
    expect(rows[0].t).toBe('attempts_before')
  })

  it("when the table's unique keys are read, then each starts with the player's id", async () => {
    const { rows } = await api.ctx.db.raw(
      `select array_agg(a.attname::text order by k.n) as cols
       from pg_index i cross join lateral unnest(i.indkey) with ordinality k(attnum, n)
       join pg_attribute a on a.attrelid = i.indrelid and a.attnum = k.attnum
       where i.indrelid = 'attempts'::regclass and i.indisunique group by i.indexrelid`,
    )
    expect(rows.map((r: { cols: string[] }) => r.cols)).toEqual([['user_id', 'id', 'created_at']])
  })
})
