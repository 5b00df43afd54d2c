import { describe, expect, it } from 'vitest'
import { shouldSeedDemo } from '../../../scripts/lib/demo-seeding.js'

describe('whether npm start seeds the demo venue', () => {
  it('when it runs its own private cluster, then it seeds the demo unless told SEED_DEMO=false', () => {
    expect(shouldSeedDemo({ privateCluster: true, seedDemo: undefined })).toBe(true)
    expect(shouldSeedDemo({ privateCluster: true, seedDemo: '' })).toBe(true)
    expect(shouldSeedDemo({ privateCluster: true, seedDemo: 'false' })).toBe(false)
  })

  it('when DATABASE_URL names another server, then it seeds the demo only when told SEED_DEMO=true', () => {
    expect(shouldSeedDemo({ privateCluster: false, seedDemo: undefined })).toBe(false)
    expect(shouldSeedDemo({ privateCluster: false, seedDemo: 'false' })).toBe(false)
    expect(shouldSeedDemo({ privateCluster: false, seedDemo: 'true' })).toBe(true)
  })

  it('when SEED_DEMO is neither true nor false, then start stops with a message naming it', () => {
    expect(() => shouldSeedDemo({ privateCluster: false, seedDemo: 'yes' })).toThrow('SEED_DEMO must be true or false')
  })
})
