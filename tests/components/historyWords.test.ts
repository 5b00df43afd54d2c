import { describe, expect, it } from 'vitest'
import { compareRevisions } from '../../shared/hang/hang-comparison.js'
import { comparisonRows } from '../../src/composables/comparisonRows'
import { signedCount, signedFigure, timeInWords } from '../../src/composables/historyWords'
import { chooseRevisions } from '../../src/composables/revisionChoice'
import { hangRevision } from './historyFixtures'

describe('chooseRevisions', () => {
  it('when the address names none, then the latest is compared with the one before it', () => {
    expect(chooseRevisions([3, 2, 1], {})).toEqual({ left: 2, right: 3, missing: [] })
  })

  it('when only the right is named, then the left is the one before it', () => {
    expect(chooseRevisions([3, 2, 1], { right: '2' })).toEqual({ left: 1, right: 2, missing: [] })
    expect(chooseRevisions([3, 2, 1], { right: '1' })).toEqual({ left: 3, right: 1, missing: [] })
  })

  it('when a named revision does not exist or is not a number, then the defaults stand in and the missing one is said', () => {
    expect(chooseRevisions([3, 2, 1], { left: '1', right: '9' })).toEqual({ left: 1, right: 3, missing: [9] })
    expect(chooseRevisions([3, 2, 1], { left: 'x', right: ['2'] })).toEqual({ left: 1, right: 2, missing: [] })
  })

  it('when there is one revision or none, then there is nothing on the left', () => {
    expect(chooseRevisions([1], {})).toEqual({ left: null, right: 1, missing: [] })
    expect(chooseRevisions([], { left: '1' })).toEqual({ left: null, right: null, missing: [1] })
  })
})

describe('timeInWords', () => {
  const now = new Date('2025-03-03T21:00:00.000Z')
  it.each([
    ['2025-03-03T20:59:30.000Z', 'just now'],
    ['2025-03-03T20:55:00.000Z', '5 minutes ago'],
    ['2025-03-03T18:00:00.000Z', '3 hours ago'],
    ['2025-03-02T18:00:00.000Z', 'yesterday'],
    ['2025-02-20T09:30:00.000Z', '2 weeks ago'],
    ['2024-11-01T09:30:00.000Z', '4 months ago'],
    ['2023-01-01T09:30:00.000Z', '2 years ago'],
  ])('when something happened at %s, then it reads "%s"', (iso, ago) => {
    expect(timeInWords(iso, { now, timeZone: 'UTC' }).ago).toBe(ago)
  })

  it('when the time zone is given, then the date and time read in it', () => {
    expect(timeInWords('2025-03-03T18:05:00.000Z', { now, timeZone: 'UTC' }).at).toBe('3 Mar 2025, 18:05')
  })
})

describe('signed differences', () => {
  it('when a difference is shown, then it carries its sign, and one that rounds to nothing reads ±0', () => {
    expect(signedFigure(28, 'weight', 'imperial')).toBe('+28 lb')
    expect(signedFigure(-1016.564, 'weight', 'imperial')).toBe('−1,016.56 lb')
    expect(signedFigure(0.001, 'weight', 'metric')).toBe('±0 kg')
    expect(signedFigure(null, 'weight', 'metric')).toBe('—')
    expect([signedCount(2), signedCount(-7), signedCount(0)]).toEqual(['+2', '−7', '±0'])
  })
})

describe('comparisonRows', () => {
  it('when two counterweight revisions are compared, then the rows run total, each line, then the counterweight', () => {
    const rows = comparisonRows(compareRevisions(hangRevision(2), hangRevision(3), 'imperial'))
    expect(rows.map((row) => row.label)).toEqual([
      'Total load',
      'Load on each lift line',
      'Line 1 at 5 ft',
      'Line 2 at 15 ft',
      'Line 3 at 25 ft',
      'Line 4 at 35 ft',
      'Counterweight',
      'Bricks needed',
      'Bricks planned',
      'Arbor side in all',
      'Out of balance',
      'Full brick, count',
    ])
    expect(rows[0]).toMatchObject({ from: '172.4 lb', to: '200.4 lb', change: '+28 lb' })
    expect(rows.find((row) => row.key === 'balance')).toMatchObject({ from: 'in balance', change: '±0 lb' })
  })
})
