import { LINESET_KIND_WORDS } from '../../../shared/schemas/lineset-words.js'
import { OPERATING_STATUS_LOOK } from '../../../shared/schemas/operating-status.js'
import { unitLabel } from '../../../shared/units/systems.js'
import { renderPdf, type PdfDocument } from './pdf-document.js'
import { bricksWords, printedDay, weightWords } from './paper-words.js'
import type { ScheduleFacts } from './schedule-facts.js'

const MARGIN = 32
const FOOTER = 24
const PADDING = 3

interface Column {
  heading: string
  width: number
  cell: (lineset: ScheduleFacts['linesets'][number], facts: ScheduleFacts) => string
}

// Widths in points across A4 landscape (842 pt less the margins); arbor contents take what is left.
const COLUMNS: Column[] = [
  { heading: 'No.', width: 34, cell: (l) => String(l.number) },
  { heading: 'Name', width: 120, cell: (l) => l.name },
  { heading: 'Kind', width: 110, cell: (l) => LINESET_KIND_WORDS[l.kind] },
  { heading: 'Status', width: 110, cell: (l) => OPERATING_STATUS_LOOK[l.operatingStatus].label },
  {
    heading: 'Hang',
    width: 160,
    cell: (l) => (l.currentHang ? `${l.currentHang.revision}: ${l.currentHang.title}` : '—'),
  },
  {
    heading: 'Load',
    width: 72,
    cell: (l, f) => (l.currentHang ? weightWords(l.currentHang.totalLoad, f.unitSystem) : '—'),
  },
  { heading: 'Arbor contents', width: 172, cell: (l) => bricksWords(l.arbor) },
]

/** The venue's lineset schedule as a PDF: one row per lineset, headings on every page, numbered pages. */
export function schedulePdf(facts: ScheduleFacts, printedAt: Date): Promise<Buffer> {
  return renderPdf(
    { size: 'A4', layout: 'landscape', margin: MARGIN, title: `${facts.venueName} lineset schedule` },
    (doc) => {
      let y = titleBlock(doc, facts, printedAt)
      y = headings(doc, y)
      doc.font('regular').fontSize(9)
      for (const lineset of facts.linesets) {
        const cells = COLUMNS.map((column) => column.cell(lineset, facts))
        const height =
          Math.max(...cells.map((text, i) => doc.heightOfString(text, { width: COLUMNS[i]!.width - 2 * PADDING }))) +
          2 * PADDING
        if (y + height > doc.page.height - MARGIN - FOOTER) {
          doc.addPage()
          y = headings(doc, MARGIN)
          doc.font('regular').fontSize(9)
        }
        row(doc, cells, y)
        y += height
        doc
          .moveTo(MARGIN, y)
          .lineTo(doc.page.width - MARGIN, y)
          .lineWidth(0.3)
          .stroke('#999999')
      }
      numberPages(doc, facts, printedAt)
    },
  )
}

function titleBlock(doc: PdfDocument, facts: ScheduleFacts, printedAt: Date) {
  doc.font('bold').fontSize(16).text(`${facts.venueName}: lineset schedule`, MARGIN, MARGIN)
  doc.font('regular').fontSize(9)
  doc.text(
    `Printed ${printedDay(printedAt)} · loads in ${unitLabel('weight', facts.unitSystem)} · ${facts.linesets.length} linesets`,
  )
  return doc.y + 8
}

function row(doc: PdfDocument, cells: string[], y: number) {
  let x = MARGIN
  cells.forEach((text, i) => {
    doc.text(text, x + PADDING, y + PADDING, { width: COLUMNS[i]!.width - 2 * PADDING })
    x += COLUMNS[i]!.width
  })
}

function headings(doc: PdfDocument, y: number) {
  doc.font('bold').fontSize(9)
  row(
    doc,
    COLUMNS.map((column) => column.heading),
    y,
  )
  const below = y + doc.currentLineHeight() + 2 * PADDING
  doc
    .moveTo(MARGIN, below)
    .lineTo(doc.page.width - MARGIN, below)
    .lineWidth(0.8)
    .stroke('#000000')
  return below
}

function numberPages(doc: PdfDocument, facts: ScheduleFacts, printedAt: Date) {
  const range = doc.bufferedPageRange()
  for (let index = range.start; index < range.start + range.count; index++) {
    doc.switchToPage(index)
    doc.page.margins.bottom = 0 // the page number sits in the margin
    doc.font('regular').fontSize(8)
    const text = `${facts.venueName} · lineset schedule · ${printedDay(printedAt)} · page ${index + 1} of ${range.count}`
    doc.text(text, MARGIN, doc.page.height - MARGIN, {
      width: doc.page.width - 2 * MARGIN,
      align: 'center',
      lineBreak: false,
    })
  }
}
