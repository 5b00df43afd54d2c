import { describe, expect, it } from 'vitest'
import { arborWeight, outOfBalanceAtBatten } from '../../../shared/engine/arbor-balance.js'
import { OPERATING_STATUSES, OPERATING_STATUS_LOOK } from '../../../shared/schemas/operating-status.js'
import { operatingStatus, type OperatingFacts } from '../../../shared/schemas/operating-status-rule.js'

const calm: OperatingFacts = {
  status: 'in-service',
  lockedOut: false,
  openTicket: null,
  feltBalance: null,
  outOfBalance: 0,
  tolerance: 10,
}

describe('operating status', () => {
  it('when nothing stands in the way, then the set is ready', () => {
    expect(operatingStatus(calm)).toBe('ready')
    expect(operatingStatus({ ...calm, outOfBalance: null })).toBe('ready')
    expect(operatingStatus({ ...calm, status: 'needs-inspection' })).toBe('ready')
  })

  it('when the figures leave it beyond the tolerance either way, then it is out of balance; at the tolerance it is not', () => {
    expect(operatingStatus({ ...calm, outOfBalance: 10 })).toBe('ready')
    expect(operatingStatus({ ...calm, outOfBalance: '10.000001' })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, outOfBalance: -10.5 })).toBe('out-of-balance')
  })

  it('when the rail felt the last completion heavy on either side, then it is out of balance whatever the figures say', () => {
    expect(operatingStatus({ ...calm, feltBalance: 'batten-heavy' })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, feltBalance: 'arbor-heavy' })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, feltBalance: 'balanced' })).toBe('ready')
  })

  it('when a ticket is open, then requested reads awaiting approval unless the figures say out of balance, loading reads loading, approved changes nothing', () => {
    expect(operatingStatus({ ...calm, openTicket: 'requested' })).toBe('awaiting-approval')
    expect(operatingStatus({ ...calm, openTicket: 'requested', outOfBalance: 50 })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, openTicket: 'requested', feltBalance: 'arbor-heavy' })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, openTicket: 'loading', outOfBalance: 50 })).toBe('loading')
    expect(operatingStatus({ ...calm, openTicket: 'approved', outOfBalance: 50 })).toBe('out-of-balance')
    expect(operatingStatus({ ...calm, openTicket: 'approved' })).toBe('ready')
  })

  it('when several hold at once, then out of service outranks a lock-out, which outranks loading', () => {
    const everything: OperatingFacts = {
      status: 'out-of-service',
      lockedOut: true,
      openTicket: 'loading',
      feltBalance: 'batten-heavy',
      outOfBalance: 99,
      tolerance: 10,
    }
    expect(operatingStatus(everything)).toBe('out-of-service')
    expect(operatingStatus({ ...everything, status: 'in-service' })).toBe('locked-out')
    expect(operatingStatus({ ...everything, status: 'in-service', lockedOut: false })).toBe('loading')
  })

  it('when the current hang says stop, then it is an unsafe hang, below a lock-out and above everything else', () => {
    expect(operatingStatus({ ...calm, hangSaysStop: true })).toBe('unsafe-hang')
    expect(operatingStatus({ ...calm, hangSaysStop: true, openTicket: 'loading', outOfBalance: 99 })).toBe(
      'unsafe-hang',
    )
    expect(operatingStatus({ ...calm, hangSaysStop: true, lockedOut: true })).toBe('locked-out')
    expect(operatingStatus({ ...calm, hangSaysStop: true, status: 'out-of-service' })).toBe('out-of-service')
    expect(operatingStatus({ ...calm, hangSaysStop: false })).toBe('ready')
  })

  it('when a status is shown, then it has words, an icon and a colour, never colour alone', () => {
    for (const status of OPERATING_STATUSES) {
      const look = OPERATING_STATUS_LOOK[status]
      expect(look.label.length).toBeGreaterThan(3)
      expect(look.icon).toMatch(/^mdi-/)
      expect(look.color).not.toBe('')
    }
    expect(new Set(OPERATING_STATUSES.map((s) => OPERATING_STATUS_LOOK[s].icon)).size).toBe(OPERATING_STATUSES.length)
  })
})

describe('arbor balance', () => {
  it('when the arbor carries frame, pipe weight and bricks, then its weight is their sum', () => {
    expect(
      arborWeight({
        emptyWeight: 90,
        pipeWeightAboard: 110,
        bricks: [
          { unitWeight: 19.5, count: 3 },
          { unitWeight: '0.1', count: 3 },
        ],
      }).toString(),
    ).toBe('258.8')
  })

  it('when stated at the batten, then out of balance is (ratio × batten side − arbor side) ÷ ratio (common practice)', () => {
    expect(outOfBalanceAtBatten(1, 308.8, 300).toString()).toBe('8.8')
    expect(outOfBalanceAtBatten(2, 500, 980).toString()).toBe('10')
    expect(outOfBalanceAtBatten(2, 500, 1030).toString()).toBe('-15')
  })
})
