import { ITEM_CATEGORIES, type ItemCategory, type ItemType } from '../../shared/schemas/index.js'

const categoryOrder = (category: ItemCategory) => ITEM_CATEGORIES.indexOf(category)

/**
 * The library as the page lists it: in the categories' own order (lighting first, as a crew reads a hang), then
 * by name; only the category chosen, and only types whose name or notes hold the text typed.
 */
export function itemTypesShown(items: readonly ItemType[], category: ItemCategory | 'all', text: string): ItemType[] {
  const wanted = text.trim().toLocaleLowerCase()
  return items
    .filter((item) => category === 'all' || item.category === category)
    .filter((item) => !wanted || `${item.name}\n${item.notes}`.toLocaleLowerCase().includes(wanted))
    .sort((a, b) => categoryOrder(a.category) - categoryOrder(b.category) || a.name.localeCompare(b.name, 'en'))
}
