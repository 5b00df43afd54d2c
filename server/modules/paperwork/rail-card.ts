import { Dec } from '../../../shared/units/decimal.js'
import { BALANCE_CAUTIONS } from '../../../shared/engine/cautions.js'
import { LINESET_KIND_WORDS, LINESET_STATUS_WORDS } from '../../../shared/schemas/lineset-words.js'
import { OPERATING_STATUS_LOOK } from '../../../shared/schemas/operating-status.js'
import { convert } from '../../../shared/units/systems.js'
import { renderPdf, type PdfDocument } from './pdf-document.js'
import { balanceWords, bricksWords, printedDay, useOf, weightWords } from './paper-words.js'
import { drawQrCode, qrMatrix } from './qr-code.js'
import type { RailCardFacts } from './rail-card-facts.js'
import { heaviestLineLoad, railCardLoadLines } from './rail-card-loads.js'

// A5 portrait: big enough to read at arm's length on a lock rail, small enough for a clip or a pin.
const MARGIN = 24
const QR_SIDE = 96

/** The rail card of a lineset as a one-page PDF. */
export function railCardPdf(facts: RailCardFacts): Promise<Buffer> {
  const title = `Lineset ${facts.lineset.number} rail card`
  return renderPdf({ size: 'A5', margin: MARGIN, title }, (doc) => {
    const width = doc.page.width - 2 * MARGIN
    heading(doc, facts, width)
    section(doc, 'Hanging now', hangLines(facts), width)
    section(doc, 'Lift line loads', railCardLoadLines(facts.hang?.result, facts.venue.unitSystem), width)
    section(doc, 'Arbor', arborLines(facts), width)
    section(doc, 'Capacities and use', capacityLines(facts), width)
    cautions(doc, width - QR_SIDE - 12)
    footer(doc, facts)
  })
}

function heading(doc: PdfDocument, { lineset }: RailCardFacts, width: number) {
  doc.font('bold').fontSize(22).text(`Lineset ${lineset.number}`, { width })
  doc.fontSize(14).text(lineset.name, { width, ellipsis: true, height: 20 })
  doc.font('regular').fontSize(10)
  doc.text(`${LINESET_KIND_WORDS[lineset.kind]} · ${LINESET_STATUS_WORDS[lineset.status]}`, { width })
  doc.font('bold').text(`Now: ${OPERATING_STATUS_LOOK[lineset.operatingStatus].label}`, { width })
}

function section(doc: PdfDocument, name: string, lines: string[], width: number) {
  doc.moveDown(0.6).font('bold').fontSize(11).text(name, { width })
  doc.font('regular').fontSize(9.5)
  for (const line of lines) doc.text(line, { width, height: 28, ellipsis: true })
}

function hangLines({ hang, venue }: RailCardFacts): string[] {
  if (!hang) return ['No hang saved on this lineset.']
  const total = convert(hang.totalLoad, 'weight', hang.unitSystem, venue.unitSystem).toNumber()
  const items = hang.items.map((item) =>
    'quantity' in item && (item.quantity ?? 1) > 1 ? `${item.label} × ${item.quantity}` : item.label,
  )
  return [
    `Revision ${hang.revision}, “${hang.title}”: ${hang.items.length} items, ${weightWords(total, venue.unitSystem)} in all`,
    items.length ? `Items: ${items.join(', ')}` : 'Items: none',
  ]
}

function arborLines({ lineset, bricks, outOfBalance, venue }: RailCardFacts): string[] {
  if (lineset.arborEmptyWeight == null) return ['This set has no arbor.']
  const brickWeight = bricks.reduce((sum, brick) => sum.plus(Dec(brick.unitWeight).times(brick.count)), Dec(0))
  const byType = bricks.map(
    (brick) => `${brick.count} × ${brick.name} (${weightWords(brick.unitWeight, venue.unitSystem)} each)`,
  )
  return [
    `Bricks: ${bricks.length ? byType.join(', ') : bricksWords(bricks)}; ${weightWords(brickWeight.toNumber(), venue.unitSystem)} of bricks`,
    `Out of balance at the batten: ${outOfBalance === null ? 'no hang to balance against' : balanceWords(outOfBalance, venue.unitSystem)}`,
  ]
}

function capacityLines({ lineset, hang, bricks, venue }: RailCardFacts): string[] {
  const system = venue.unitSystem
  const result = hang?.result
  const inVenueUnits = (value: number) => convert(value, 'weight', result!.units, system).toNumber()
  const lines = [`Rated load: ${useOf(result ? inVenueUnits(result.totalLoad) : 0, lineset.ratedLoad, system)} hung`]
  if (lineset.arborCapacity != null) {
    const aboard = bricks.reduce((sum, brick) => sum + brick.unitWeight * brick.count, 0)
    lines.push(`Arbor capacity: ${useOf(aboard, lineset.arborCapacity, system)} in bricks`)
  }
  if (result?.lineWorkingLoadLimit !== undefined && result.lineLoads.length) {
    const heaviest = heaviestLineLoad(result)
    lines.push(
      `Lift line working load limit: ${useOf(inVenueUnits(heaviest), inVenueUnits(result.lineWorkingLoadLimit), system)} on the heaviest line`,
    )
  }
  return lines
}

function cautions(doc: PdfDocument, width: number) {
  doc.moveDown(0.6).font('bold').fontSize(9.5).text('Before any weight moves', { width })
  doc.font('regular').fontSize(7.5)
  for (const caution of BALANCE_CAUTIONS) doc.text(`• ${caution}`, { width })
}

function footer(doc: PdfDocument, facts: RailCardFacts) {
  doc.page.margins.bottom = 0 // the footer sits in the margin; nothing here may start a second page
  const bottom = doc.page.height - MARGIN
  const qrTop = bottom - QR_SIDE - 12
  drawQrCode(doc, qrMatrix(facts.linkUrl), doc.page.width - MARGIN - QR_SIDE, qrTop, QR_SIDE)
  const approval = facts.approvedBy
    ? `Last change approved by ${facts.approvedBy.name} on ${printedDay(facts.approvedBy.at)}`
    : 'No weight change approved in Loftledger yet'
  const width = doc.page.width - 2 * MARGIN - QR_SIDE - 12
  doc.font('regular').fontSize(8)
  doc.text(approval, MARGIN, bottom - 34, { width, lineBreak: false })
  doc.text(`Printed ${printedDay(facts.printedAt)} · ${facts.venue.name}`, MARGIN, bottom - 22, {
    width,
    lineBreak: false,
  })
  doc.fontSize(6).text(facts.linkUrl, MARGIN, bottom - 8, {
    width: doc.page.width - 2 * MARGIN,
    align: 'right',
    lineBreak: false,
  })
}
