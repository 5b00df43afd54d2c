import QRCode from 'qrcode'
import type { PdfDocument } from './pdf-document.js'

/** A QR code's modules: `size` x `size`, row by row, true where a module is dark. */
export interface QrMatrix {
  size: number
  dark: (row: number, column: number) => boolean
}

/** The QR code a paper prints for `text` (medium error correction: it survives a crease or a pin hole). */
export function qrMatrix(text: string): QrMatrix {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' })
  return { size: modules.size, dark: (row, column) => modules.get(row, column) === 1 }
}

/** The quiet zone a reader needs around the code, in modules (ISO/IEC 18004 asks for four). */
export const QR_QUIET_MODULES = 4

/** Draws `matrix` as vector squares with its quiet zone, `side` points wide in all, top left at `x`, `y`. */
export function drawQrCode(doc: PdfDocument, matrix: QrMatrix, x: number, y: number, side: number) {
  const module = side / (matrix.size + 2 * QR_QUIET_MODULES)
  doc.save().rect(x, y, side, side).fill('#ffffff').fillColor('#000000')
  for (let row = 0; row < matrix.size; row++)
    for (let column = 0; column < matrix.size; column++)
      if (matrix.dark(row, column))
        doc.rect(x + (column + QR_QUIET_MODULES) * module, y + (row + QR_QUIET_MODULES) * module, module, module)
  doc.fill().restore()
}
