import { describe, expect, it } from 'vitest'
import { positionsBeyondBatten } from '../../../shared/hang/entry-bounds.js'
import { hangSaveSchemaFor } from '../../../shared/schemas/hang.js'

const body = (items: unknown[]) => ({ title: 'Act one', basedOnRevision: null, items, unitSystem: 'imperial' })
const fieldsOf = (items: unknown[]) =>
  hangSaveSchemaFor('imperial')
    .safeParse(body(items))
    .error?.issues.map((issue) => issue.path.join('.'))

describe('hang entries', () => {
  it('when each shape is entered, then it is told by the field only it has and a point defaults to one unit', () => {
    const parsed = hangSaveSchemaFor('imperial').parse(
      body([
        { label: 'Sandbag', category: 'hardware', weight: 25, at: 20 },
        { label: 'Cable', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
        { label: 'Wall', category: 'scenery', weight: 300, points: [5, 20, 35] },
      ]),
    )
    expect(parsed.items[0]).toEqual({ label: 'Sandbag', category: 'hardware', weight: 25, at: 20, quantity: 1 })
    expect(parsed.items).toHaveLength(3)
  })

  it('when a stretch is reversed, fabric gives both grade and weight per area, or library units give a point and a stretch, then each names its field', () => {
    expect(
      fieldsOf([
        { label: 'A', category: 'other', weightPerLength: 1, from: 30, to: 10 },
        {
          label: 'B',
          category: 'soft-goods',
          from: 0,
          to: 40,
          fabric: { gradeOzPerLinearYard: 25, weightPerArea: 0.1, height: 20, fullnessPercent: 50 },
        },
        {
          label: 'C',
          category: 'lighting',
          itemTypeId: '00000000-0000-4000-8000-000000000001',
          quantity: 2,
          at: 5,
          from: 0,
          to: 10,
        },
      ]),
    ).toEqual(['items.0.to', 'items.1.fabric.gradeOzPerLinearYard', 'items.2.at'])
  })

  it('when a client sends a result of its own, then the schema drops it', () => {
    const parsed = hangSaveSchemaFor('imperial').parse({ ...body([]), result: { totalLoad: 1 } })
    expect(parsed).not.toHaveProperty('result')
  })

  it('when positions lie past the far end of the batten, then each is named by its field', () => {
    expect(
      positionsBeyondBatten(
        [
          { label: 'A', category: 'other', weight: 1, at: 41 },
          { label: 'B', category: 'scenery', weight: 1, points: [5, 45] },
          { label: 'C', category: 'other', weightPerLength: 1, from: 0, to: 40 },
        ],
        40,
      ).map(({ index, field }) => `${index}.${field}`),
    ).toEqual(['0.at', '1.points.1'])
  })
})
