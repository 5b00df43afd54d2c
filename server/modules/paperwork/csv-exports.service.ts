import { csvDocument, safeFileName, type CsvCell } from '../../../shared/paperwork/csv.js'
import { HANG_COLUMNS, hangColumnHeader, hangEntryCells } from '../../../shared/paperwork/hang-columns.js'
import { LINESET_KIND_WORDS, LINESET_STATUS_WORDS } from '../../../shared/schemas/lineset-words.js'
import { OPERATING_STATUS_LOOK } from '../../../shared/schemas/operating-status.js'
import { unitLabel } from '../../../shared/units/systems.js'
import type { ServiceContext } from '../../context.js'
import { notFound } from '../../http/errors.js'
import { getHang } from '../hangs/hang.service.js'
import { listLinesetEvents } from '../linesets/lineset-events.service.js'
import { CSV_TYPE, type Paper } from './download.js'
import { scheduleFacts } from './schedule-facts.js'

/** The lineset schedule: one record per lineset, figures in the venue's units, one column per brick type aboard. */
export async function scheduleCsv(ctx: ServiceContext): Promise<Paper> {
  const facts = await scheduleFacts(ctx)
  const weight = unitLabel('weight', facts.unitSystem)
  const header = [
    'Number',
    'Name',
    'Kind',
    'Status',
    'Operating status',
    'Hang revision',
    'Hang title',
    `Total load (${weight})`,
    ...facts.brickNames.map((name) => `Bricks on the arbor: ${name} (count)`),
  ]
  const rows = facts.linesets.map((lineset): CsvCell[] => [
    lineset.number,
    lineset.name,
    LINESET_KIND_WORDS[lineset.kind],
    LINESET_STATUS_WORDS[lineset.status],
    OPERATING_STATUS_LOOK[lineset.operatingStatus].label,
    lineset.currentHang?.revision,
    lineset.currentHang?.title,
    lineset.currentHang?.totalLoad,
    ...facts.brickNames.map((name) => lineset.arbor.find((brick) => brick.name === name)?.count ?? 0),
  ])
  return {
    body: csvDocument(header, rows),
    contentType: CSV_TYPE,
    fileName: safeFileName(`${facts.venueName} lineset schedule`, 'csv'),
  }
}

async function linesetNumber(ctx: ServiceContext, linesetId: string) {
  const lineset = await ctx.db.models.Lineset.findOne({
    where: { id: linesetId, venueId: ctx.actor.venueId },
    attributes: ['number'],
    transaction: ctx.transaction,
  })
  if (!lineset) throw notFound('That lineset')
  return lineset.number
}

/** A lineset's whole ledger, newest first, in the words and units the history page shows. */
export async function ledgerCsv(ctx: ServiceContext, linesetId: string): Promise<Paper> {
  const number = await linesetNumber(ctx, linesetId)
  const rows: CsvCell[][] = []
  let before: string | undefined
  do {
    const page = await listLinesetEvents(ctx, linesetId, { limit: 100, ...(before ? { before } : {}) })
    for (const event of page.events) rows.push([event.occurredAt, event.type, event.actor?.name ?? '', event.summary])
    before = page.next ?? undefined
  } while (before)
  return {
    body: csvDocument(['When (UTC)', 'Entry', 'Who', 'What happened'], rows),
    contentType: CSV_TYPE,
    fileName: safeFileName(`lineset ${number} ledger`, 'csv'),
  }
}

/** A saved revision's items, one record per entry, as the hang import reads them back. */
export async function hangItemsCsv(ctx: ServiceContext, linesetId: string, hangId: string): Promise<Paper> {
  const number = await linesetNumber(ctx, linesetId)
  const hang = await getHang(ctx, linesetId, hangId)
  // Retired item types too: a saved hang keeps naming what it hung.
  const types = await ctx.db.models.ItemType.findAll({
    where: { venueId: ctx.actor.venueId },
    attributes: ['id', 'name'],
    transaction: ctx.transaction,
  })
  const names = new Map(types.map((type) => [type.id, type.name]))
  const header = HANG_COLUMNS.map((column) => hangColumnHeader(column, hang.unitSystem))
  return {
    body: csvDocument(
      header,
      hang.items.map((entry) => hangEntryCells(entry, names)),
    ),
    contentType: CSV_TYPE,
    fileName: safeFileName(`lineset ${number} hang ${hang.revision} items`, 'csv'),
  }
}
