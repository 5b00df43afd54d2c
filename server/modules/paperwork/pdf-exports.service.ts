import { safeFileName } from '../../../shared/paperwork/csv.js'
import type { ServiceContext } from '../../context.js'
import { PDF_TYPE, type Paper } from './download.js'
import { railCardFacts } from './rail-card-facts.js'
import { railCardPdf } from './rail-card.js'
import { scheduleFacts } from './schedule-facts.js'
import { schedulePdf } from './schedule-pdf.js'

/** A lineset's rail card, one page to pin at the rail. */
export async function railCard(ctx: ServiceContext, linesetId: string): Promise<Paper> {
  const facts = await railCardFacts(ctx, linesetId)
  return {
    body: await railCardPdf(facts),
    contentType: PDF_TYPE,
    fileName: safeFileName(`lineset ${facts.lineset.number} rail card`, 'pdf'),
  }
}

/** The venue's lineset schedule with numbered pages. */
export async function schedule(ctx: ServiceContext): Promise<Paper> {
  const facts = await scheduleFacts(ctx)
  return {
    body: await schedulePdf(facts, ctx.clock.now()),
    contentType: PDF_TYPE,
    fileName: safeFileName(`${facts.venueName} lineset schedule`, 'pdf'),
  }
}
