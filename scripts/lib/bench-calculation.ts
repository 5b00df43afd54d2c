/**
 * A `POST /calculations` body as the lineset page sends it: a 40 ft batten on five lift lines, `count` things
 * hung (every fourth a run of cable), two brick types. Invented figures, typed with two decimals at most.
 */
export function calculationOfItems(count: number) {
  return {
    units: 'imperial',
    kind: 'counterweight-single',
    batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40] },
    items: Array.from({ length: count }, (_, k) =>
      k % 4 === 3
        ? { label: `Cable ${k}`, weightPerLength: 0.5, from: k % 10, to: 40 - (k % 7) }
        : { label: `Fixture ${k}`, weight: 12 + (k % 7) * 3.5, at: Math.round(((k * 7.3) % 40) * 100) / 100 },
    ),
    arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
    bricks: [
      { name: 'full', weight: 20, thickness: 2, available: 80 },
      { name: 'half', weight: 10, thickness: 1, available: 10 },
    ],
    liftLine: { weightPerLength: 0.11, breakingStrength: 7000, designFactor: 8 },
    tolerance: 10,
    trims: { in: 4, out: 50 },
  }
}
