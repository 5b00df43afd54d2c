import { createRequire } from 'node:module'
import PDFDocument from 'pdfkit'

const require = createRequire(import.meta.url)
const fontFolder = require.resolve('@fontsource/roboto/package.json').replace(/package\.json$/, 'files/')

/**
 * The fonts the client ships, embedded in every paper. pdfkit reads `.woff` (its `.woff2` crashes it at the
 * end), and each file is one Unicode subset: latin covers our words, figures, units and punctuation.
 */
export const PDF_FONTS = {
  regular: `${fontFolder}roboto-latin-400-normal.woff`,
  bold: `${fontFolder}roboto-latin-700-normal.woff`,
} as const

export type PdfDocument = InstanceType<typeof PDFDocument>

/**
 * Writes a PDF with `draw` and answers its bytes. Pages are buffered so the caller may number them at the
 * end; the document's own font is Roboto from the start, so no standard PDF font is ever named.
 */
export function renderPdf(
  options: { size: string; layout?: 'portrait' | 'landscape'; margin: number; title: string },
  draw: (doc: PdfDocument) => void,
): Promise<Buffer> {
  const doc = new PDFDocument({
    size: options.size,
    layout: options.layout ?? 'portrait',
    margin: options.margin,
    font: PDF_FONTS.regular,
    bufferPages: true,
    info: { Title: options.title, Creator: 'Loftledger' },
  })
  doc.registerFont('regular', PDF_FONTS.regular)
  doc.registerFont('bold', PDF_FONTS.bold)
  const chunks: Buffer[] = []
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk))
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
  })
  draw(doc)
  doc.end()
  return finished
}
