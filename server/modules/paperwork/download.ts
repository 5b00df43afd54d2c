import type { Response } from 'express'

/** What the papers hand back: the bytes, their type and a file name already made safe (`safeFileName`). */
export interface Paper {
  body: string | Buffer
  contentType: string
  fileName: string
}

/**
 * Sends a paper: CSV as an attachment (a spreadsheet opens it), PDF inline (the browser shows it, and saving
 * keeps the name). The name is ASCII by construction, so both `filename` forms carry it unchanged.
 */
export function sendPaper(res: Response, paper: Paper, disposition: 'attachment' | 'inline') {
  res.setHeader('Content-Type', paper.contentType)
  res.setHeader(
    'Content-Disposition',
    `${disposition}; filename="${paper.fileName}"; filename*=UTF-8''${encodeURIComponent(paper.fileName)}`,
  )
  res.send(paper.body)
}

export const CSV_TYPE = 'text/csv; charset=utf-8'
export const PDF_TYPE = 'application/pdf'
