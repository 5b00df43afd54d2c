import sharp from 'sharp'

/** A small picture made here, in the format asked (a gradient, so it compresses like a real photo a little). */
export async function sampleImage(format: 'png' | 'jpeg' | 'webp', width = 640, height = 480): Promise<Buffer> {
  const pixels = Buffer.alloc(width * height * 3)
  for (let i = 0; i < pixels.length; i += 3) {
    const x = (i / 3) % width
    pixels[i] = x % 256
    pixels[i + 1] = (i / 3 / width) % 256
    pixels[i + 2] = 128
  }
  return sharp(pixels, { raw: { width, height, channels: 3 } })
    .toFormat(format)
    .toBuffer()
}

/** The smallest well-formed PDF: one empty page (PDF 1.4 structure, written by hand). */
export const samplePdf = Buffer.from(
  '%PDF-1.4\n1 0 obj <</Type /Catalog /Pages 2 0 R>> endobj\n2 0 obj <</Type /Pages /Kids [3 0 R] /Count 1>> endobj\n' +
    '3 0 obj <</Type /Page /Parent 2 0 R /MediaBox [0 0 612 792]>> endobj\ntrailer <</Root 1 0 R>>\n%%EOF\n',
)

/** The opening of a Windows program (the `MZ` header and the PE signature), as a renamed download would carry. */
export const sampleExecutable = Buffer.concat([
  Buffer.from('MZ'),
  Buffer.alloc(58),
  Buffer.from([0x80, 0, 0, 0]),
  Buffer.alloc(64),
  Buffer.from('PE\0\0'),
  Buffer.alloc(200),
])

/** A web page that would run a script if a browser were ever tricked into showing it. */
export const sampleHtml = Buffer.from(
  '<!doctype html><html><body><script>alert(document.cookie)</script></body></html>',
)

/**
 * A `multipart/form-data` body written byte by byte, so a test controls the file name exactly as sent
 * (form libraries cut paths off or escape characters before a server could see them).
 */
export function multipartBody(parts: {
  fileNameHeader: string
  bytes: Buffer
  fields?: Record<string, string>
  fileField?: string
}) {
  const boundary = '----loftledger-test-boundary'
  const chunks: Buffer[] = []
  for (const [name, value] of Object.entries(parts.fields ?? {}))
    chunks.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`))
  chunks.push(
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="${parts.fileField ?? 'file'}"; ${parts.fileNameHeader}\r\n` +
        'Content-Type: application/octet-stream\r\n\r\n',
      'utf8',
    ),
    parts.bytes,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  )
  return { body: Buffer.concat(chunks), contentType: `multipart/form-data; boundary=${boundary}` }
}
