import type { TicketView } from '../../shared/schemas/index.js'

/** One step of guided loading: what to do, the caution that stands beside it, and a key to tick it by. */
export interface LoadingStep {
  key: string
  title: string
  detail: string
  caution: string
}

const bricksWords = (lines: readonly { name: string; count: number }[]) =>
  lines.map((line) => `${Math.abs(line.count)} × ${line.name}`).join(', ')

/**
 * The checklist for loading a ticket, drawn from its plan. Weight going on: the batten load first, then the
 * arbor. Weight coming off: the arbor first, then the batten load. Calls between the rail and the loading
 * gallery come before any weight moves, and the lock is checked before and after.
 *
 * @example
 * loadingChecklist(ticket).map((step) => step.key) // ['lock', 'call', 'batten-on', 'arbor-on', 'call-done', 'lock-after']
 */
export function loadingChecklist(ticket: Pick<TicketView, 'changes' | 'lineset'>): LoadingStep[] {
  const on = ticket.changes.filter((change) => change.count > 0)
  const off = ticket.changes.filter((change) => change.count < 0)
  const set = `lineset ${ticket.lineset.number} (${ticket.lineset.name})`
  const steps: LoadingStep[] = [
    {
      key: 'lock',
      title: `Check the rope lock on ${set}`,
      detail: 'The lock is closed and the safety ring or collar is on. The set reads "loading, do not operate".',
      caution: 'The rope lock holds a balanced set; it is not a brake.',
    },
    {
      key: 'call',
      title: 'Call between the rail and the loading gallery',
      detail: `Rail and gallery agree, out loud, who moves what and when, and the deck below the gallery is clear.`,
      caution: 'Call and answer before any weight moves.',
    },
  ]
  if (off.length)
    steps.push(
      {
        key: 'arbor-off',
        title: `Take the bricks off the arbor first: ${bricksWords(off)}`,
        detail: 'At the loading gallery, with the batten at its loading height and the rail holding the purchase line.',
        caution: 'Unload the arbor before the batten, so the batten side never runs away.',
      },
      {
        key: 'batten-off',
        title: 'Then take the load off the batten',
        detail: 'Only once the gallery calls that the bricks are off.',
        caution: 'Never let go of a set that is out of balance.',
      },
    )
  if (on.length)
    steps.push(
      {
        key: 'batten-on',
        title: 'Hang the new load on the batten first',
        detail: 'Everything in the hang revision, at the positions it gives.',
        caution: 'Load the batten before the arbor, so the arbor side never runs away.',
      },
      {
        key: 'arbor-on',
        title: `Then put the bricks on the arbor: ${bricksWords(on)}`,
        detail: 'Spreader plates as the stack grows; the gallery calls each stage back to the rail.',
        caution: 'Know what a piece weighs before it is hung; never go past a posted capacity.',
      },
    )
  if (!on.length && !off.length)
    steps.push({
      key: 'no-bricks',
      title: 'No bricks move for this change',
      detail: 'Change the batten load as the revision says; the arbor stays as it is.',
      caution: 'Rebalance every time anything on the batten changes.',
    })
  steps.push(
    {
      key: 'call-done',
      title: 'Call the change done between the gallery and the rail',
      detail: 'The gallery is clear of loose bricks and tools before the set moves.',
      caution: 'If a set runs away, do not grab the line: shout a warning and get everyone clear.',
    },
    {
      key: 'lock-after',
      title: 'Check the lock again, then feel the balance at the rail',
      detail: 'With the lock open, move the set a little and note whether it is balanced, batten heavy or arbor heavy.',
      caution: 'Only trained people may operate or load a lineset.',
    },
  )
  return steps
}
