/**
 * Whether `npm start` may seed the demo venue, whose passwords are published. On the private cluster it makes
 * for itself, yes (the demo is the point of a first run) unless `SEED_DEMO=false`; on a server named by
 * `DATABASE_URL`, only when asked with `SEED_DEMO=true`, so a real deployment never gains accounts anyone can
 * sign in to.
 * @throws Error when SEED_DEMO is set to anything but true or false.
 */
export function shouldSeedDemo(options: { privateCluster: boolean; seedDemo: string | undefined }): boolean {
  const { privateCluster, seedDemo } = options
  if (seedDemo === undefined || seedDemo === '') return privateCluster
  if (seedDemo === 'true' || seedDemo === 'false') return seedDemo === 'true'
  throw new Error(`SEED_DEMO must be true or false, not "${seedDemo}"`)
}
