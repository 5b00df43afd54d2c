import { INVENTORY_EDITORS, OUTBOX_READERS, PEOPLE_MANAGERS, ROLES, type Role } from '../../shared/schemas/role.js'

export interface NavigationEntry {
  title: string
  icon: string
  routeName: string
  testid: string
  roles: readonly Role[]
}

const ENTRIES: readonly NavigationEntry[] = [
  { title: 'Board', icon: 'mdi-view-dashboard-outline', routeName: 'board', testid: 'nav-board', roles: ROLES },
  {
    title: 'Linesets',
    icon: 'mdi-format-list-numbered',
    routeName: 'linesets-list',
    testid: 'nav-linesets',
    roles: ROLES,
  },
  {
    title: 'Change tickets',
    icon: 'mdi-clipboard-check-outline',
    routeName: 'tickets-list',
    testid: 'nav-tickets',
    roles: ROLES,
  },
  { title: 'Bricks', icon: 'mdi-cube-outline', routeName: 'brick-types-list', testid: 'nav-bricks', roles: ROLES },
  {
    title: 'Item library',
    icon: 'mdi-bookshelf',
    routeName: 'item-types-list',
    testid: 'nav-item-library',
    roles: ROLES,
  },
  {
    title: 'Productions',
    icon: 'mdi-drama-masks',
    routeName: 'productions-list',
    testid: 'nav-productions',
    roles: ROLES,
  },
  {
    title: 'People',
    icon: 'mdi-account-group-outline',
    routeName: 'people-list',
    testid: 'nav-people',
    roles: PEOPLE_MANAGERS,
  },
  {
    title: 'Outgoing mail',
    icon: 'mdi-email-fast-outline',
    routeName: 'outbox-list',
    testid: 'nav-outbox',
    roles: OUTBOX_READERS,
  },
  {
    title: 'Venue settings',
    icon: 'mdi-tune-variant',
    routeName: 'venue-settings',
    testid: 'nav-venue-settings',
    roles: INVENTORY_EDITORS,
  },
]

/** The drawer entries a role may open; the routes carry the same roles, so the two cannot drift far. */
export const navigationFor = (role: Role | undefined) =>
  role ? ENTRIES.filter((entry) => entry.roles.includes(role)) : []
