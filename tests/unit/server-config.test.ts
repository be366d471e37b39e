// The server's configuration from the environment: the background drain's switch (bench:ingest
// turns it off to time the request path alone; every other launcher leaves it on).
import { describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config'

const BASE = { DATABASE_URL: 'postgres://127.0.0.1/ambitus', JWT_SECRET: 'x'.repeat(32) }

describe('loadConfig', () => {
  it('rolls up answers in the background unless STATISTICS_DRAIN is off', () => {
    expect(loadConfig(BASE).backgroundDrain).toBe(true)
    expect(loadConfig({ ...BASE, STATISTICS_DRAIN: '' }).backgroundDrain).toBe(true)
    expect(loadConfig({ ...BASE, STATISTICS_DRAIN: 'on' }).backgroundDrain).toBe(true)
    expect(loadConfig({ ...BASE, STATISTICS_DRAIN: 'off' }).backgroundDrain).toBe(false)
    expect(loadConfig({ ...BASE, STATISTICS_DRAIN: '0' }).backgroundDrain).toBe(false)
  })
})
