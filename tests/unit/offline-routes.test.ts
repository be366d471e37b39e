// Which API answers the service worker keeps for offline practice, and which requests wipe them.
import { describe, expect, it } from 'vitest'
import { changesSession, isOfflineApi, planItemUrls } from '../../src/service-worker/offline-routes'

const ITEM = '0b9c1f52-7a4e-4c3b-9d2f-5e6a7b8c9d0e'

describe('offline routes', () => {
  it.each([
    ['GET', '/api/auth/me', true],
    ['GET', '/api/instruments', true],
    ['GET', '/api/instruments/presets', true],
    ['GET', '/api/plans/assigned', true],
    ['GET', `/api/plans/items/${ITEM}`, true],
    ['GET', '/api/focus', true],
    ['GET', '/api/progress/fingerings', true],
    ['POST', '/api/instruments', false], // writes are never answered from a cache
    ['GET', '/api/progress/summary', false], // figures must be current, not remembered
    ['GET', '/api/studio/roster', false], // other people's data stays out of the cache
    ['GET', '/api/admin/users', false],
    ['GET', '/api/plans/items/../../admin', false],
  ])('%s %s is kept for offline use: %s', (method, path, kept) => {
    expect(isOfflineApi(method, path)).toBe(kept)
  })

  it.each([
    ['POST', '/api/auth/login', true],
    ['POST', '/api/auth/logout', true],
    ['POST', '/api/auth/register', true],
    ['POST', '/api/auth/password-reset/confirm', true],
    ['POST', '/api/invitations/accept', true],
    ['POST', '/api/attempts', false],
    ['GET', '/api/auth/me', false],
  ])('%s %s means the person may change: %s', (method, path, changes) => {
    expect(changesSession(method, path)).toBe(changes)
  })

  it('lists the plan items of the assigned plans, and nothing for an answer of another shape', () => {
    const answer = { assignments: [{ items: [{ id: ITEM }, { id: 7 }] }, { items: [] }, {}] }
    expect(planItemUrls(answer)).toEqual([`/api/plans/items/${ITEM}`])
    expect(planItemUrls({ error: { code: 'forbidden' } })).toEqual([])
    expect(planItemUrls(null)).toEqual([])
  })
})
