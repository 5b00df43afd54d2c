// The benchmark's venue: 80 linesets with a saved hang each and a ledger of 5,000 entries (invented data).
import { hangSaveSchemaFor } from '../../shared/schemas/hang.js'
import { linesetInputSchemaFor } from '../../shared/schemas/lineset.js'
import type { AppContext } from '../../server/context.js'
import { saveHang } from '../../server/modules/hangs/hang.service.js'
import { createLineset } from '../../server/modules/linesets/lineset.service.js'
import { PASSWORD, sampleLineset, seedVenue } from '../../tests/support/fixtures.js'

export const BENCH_LINESETS = 80
export const BENCH_LEDGER_ENTRIES = 5_000

/** Twelve things hung on a 40 ft batten, every third a run of cable. */
const hungItems = (seed: number) =>
  Array.from({ length: 12 }, (_, k) =>
    k % 3 === 2
      ? { label: `Cable ${k}`, category: 'hardware', weightPerLength: 0.5, from: k, to: 40 - k }
      : { label: `Fixture ${k}`, category: 'lighting', weight: 10 + ((seed + k) % 9) * 2.5, at: (k * 3.3) % 40 },
  )

export interface BenchVenue {
  email: string
  password: string
}

/**
 * Seeds through the services (as the venue's administrator and fly operator), then copies the ledger's real
 * entries at earlier times until it holds `BENCH_LEDGER_ENTRIES`: the database refuses edits, not inserts.
 */
export async function seedBenchVenue(app: AppContext): Promise<BenchVenue> {
  const venue = await seedVenue(app, 'bench')
  const asAdministrator = { ...app, actor: venue.members.administrator }
  const asFlyOperator = { ...app, actor: venue.members['fly-operator'] }
  const linesetIds = [venue.linesetId]
  for (let number = 2; number <= BENCH_LINESETS; number++) {
    const body = linesetInputSchemaFor('imperial').parse(sampleLineset(number, { name: `Electric ${number}` }))
    linesetIds.push((await createLineset(asAdministrator, body)).id)
  }
  for (const [index, linesetId] of linesetIds.entries()) {
    const body = hangSaveSchemaFor('imperial').parse({
      title: `Act one, electric ${index + 1}`,
      basedOnRevision: null,
      items: hungItems(index),
      unitSystem: 'imperial',
    })
    await saveHang(asFlyOperator, linesetId, body)
  }
  const [[{ count }]] = (await app.db.sequelize.query('SELECT count(*)::int AS count FROM lineset_events')) as [
    [{ count: number }],
    unknown,
  ]
  const copies = Math.ceil((BENCH_LEDGER_ENTRIES - count) / count)
  await app.db.sequelize.query(
    `INSERT INTO lineset_events (venue_id, lineset_id, occurred_at, actor_id, event_type, payload)
     SELECT venue_id, lineset_id, occurred_at - make_interval(hours => copy), actor_id, event_type, payload
     FROM lineset_events, generate_series(1, :copies) AS copy
     ORDER BY copy, id LIMIT :missing`,
    { replacements: { copies, missing: BENCH_LEDGER_ENTRIES - count } },
  )
  return { email: venue.emails['technical-director'], password: PASSWORD }
}
