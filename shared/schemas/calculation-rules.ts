import type * as z from 'zod'
import { pickPointProblems, SINGLE_LINE_HEMP_RULE, wrongLineCount } from './batten-rules.js'

/** The parts of a parsed input the cross-field rules read. */
interface RuleInput {
  kind: string
  batten: { length: number; weightPerLength?: number; pickPoints: number[]; pipeSize?: string; pipe?: object }
  items: Array<{ weight?: number; at?: number; weightPerLength?: number; from?: number; to?: number }>
  arbor?: object
  hoist?: object
  liftLine?: { lengths?: number[] }
}

type Context = z.core.$RefinementCtx<RuleInput>

function fail(ctx: Context, path: Array<string | number>, message: string): void {
  ctx.addIssue({ code: 'custom', path, message })
}

function checkBatten(input: RuleInput, ctx: Context): void {
  for (const { index, message } of pickPointProblems(input.batten.pickPoints, input.batten.length))
    fail(ctx, ['batten', 'pickPoints', index], message)
  if (input.batten.weightPerLength === undefined && input.batten.pipeSize === undefined)
    fail(ctx, ['batten', 'weightPerLength'], 'Batten weight per length is required when no pipe size is chosen')
  if (input.batten.pipe && input.batten.pipeSize)
    fail(ctx, ['batten', 'pipe'], 'Give either a pipe size or the pipe section properties, not both')
}

function checkItems(input: RuleInput, ctx: Context): void {
  const { length } = input.batten
  input.items.forEach((item, index) => {
    const path = (field: string) => ['items', index, field]
    const isPoint = item.weight !== undefined || item.at !== undefined
    const isSpan = item.weightPerLength !== undefined || item.from !== undefined || item.to !== undefined
    if (isPoint && isSpan)
      return fail(
        ctx,
        ['items', index],
        'An item is either at a point (weight, at) or along a span (weightPerLength, from, to), not both',
      )
    if (!isPoint && !isSpan)
      return fail(ctx, ['items', index], 'An item needs a weight and a position, or a weight per length')
    if (isPoint) {
      if (item.weight === undefined) fail(ctx, path('weight'), 'Item weight is required')
      if (item.at === undefined) fail(ctx, path('at'), 'Item position is required')
      else if (item.at > length) fail(ctx, path('at'), `Item at ${item.at} is beyond the batten's length of ${length}`)
      return
    }
    if (item.weightPerLength === undefined) fail(ctx, path('weightPerLength'), 'Item weight per length is required')
    const from = item.from ?? 0
    const to = item.to ?? length
    if (from > length) fail(ctx, path('from'), `Span start at ${from} is beyond the batten's length of ${length}`)
    if (to > length) fail(ctx, path('to'), `Span end at ${to} is beyond the batten's length of ${length}`)
    else if (from >= to) fail(ctx, path('to'), `Span end (${to}) must be beyond its start (${from})`)
  })
}

function checkKind(input: RuleInput, ctx: Context): void {
  if (wrongLineCount(input.kind, input.batten.pickPoints.length))
    fail(ctx, ['batten', 'pickPoints'], SINGLE_LINE_HEMP_RULE)
  if (input.kind.startsWith('counterweight') && !input.arbor)
    fail(ctx, ['arbor'], 'A counterweight set needs its arbor (empty weight, capacity, stack length)')
  if (input.kind === 'motorized' && !input.hoist)
    fail(ctx, ['hoist'], 'A motorized set needs its hoist (rated capacity)')
}

/**
 * Cross-field rules of a calculation input, each issue on the precise field.
 *
 * @example
 * calculationInputSchema.safeParse(withPickPoints([0, 20, 10])) // issue at batten.pickPoints.2
 */
export function checkCalculationInput(input: RuleInput, ctx: Context): void {
  checkBatten(input, ctx)
  checkItems(input, ctx)
  checkKind(input, ctx)
  const lengths = input.liftLine?.lengths
  if (lengths && lengths.length !== input.batten.pickPoints.length)
    fail(ctx, ['liftLine', 'lengths'], 'Give one lift line length for each pick point, in the same order')
}
