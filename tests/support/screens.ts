import type { Role } from '../../shared/schemas/role.js'
import { INVENTORY_EDITORS, OUTBOX_READERS, PEOPLE_MANAGERS, ROLES } from '../../shared/schemas/role.js'

/** Records a screen's path needs, read from the demo venue once per run. */
export interface DemoIds {
  linesetId: string
  ticketId: string
}

export interface Screen {
  name: string
  path: (ids: DemoIds) => string
  /** Shown once the screen has read what it shows (a selector; several are alternatives). */
  ready: string
  /** Who may open it signed in; absent: a page visited signed out. */
  roles?: readonly Role[]
}

/**
 * Every screen of the client, as the accessibility test visits it. A new screen joins here: its path, what marks
 * it as loaded, and the roles its route allows (the same constants the router uses).
 */
export const SCREENS: readonly Screen[] = [
  { name: 'sign-in', path: () => '/sign-in', ready: '[data-testid=sign-in-form][data-ready=true]:not([data-early])' },
  {
    name: 'invitation (unusable)',
    path: () => '/invitation/no-such-token',
    ready: '[data-testid=invitation-unusable]',
  },
  {
    name: 'board',
    path: () => '/board',
    ready: '[data-testid=board-linesets], [data-testid=board-empty]',
    roles: ROLES,
  },
  { name: 'linesets list', path: () => '/linesets', ready: '[data-testid^=linesets-row-]', roles: ROLES },
  {
    name: 'lineset page',
    path: (ids) => `/linesets/${ids.linesetId}`,
    ready: '[data-testid=lineset-form]',
    roles: ROLES,
  },
  {
    name: 'lineset history',
    path: (ids) => `/linesets/${ids.linesetId}/history`,
    ready: '[data-testid=history-back]',
    roles: ROLES,
  },
  { name: 'new lineset', path: () => '/linesets/new', ready: '[data-testid=lineset-form]', roles: INVENTORY_EDITORS },
  { name: 'bricks', path: () => '/bricks', ready: '[data-testid=brick-types-table]', roles: ROLES },
  {
    name: 'change tickets',
    path: () => '/tickets',
    ready: '[data-testid=tickets-list], [data-testid=tickets-empty]',
    roles: ROLES,
  },
  {
    name: 'change ticket',
    path: (ids) => `/tickets/${ids.ticketId}`,
    ready: '[data-testid=ticket-opened]',
    roles: ROLES,
  },
  { name: 'item library', path: () => '/item-library', ready: '[data-testid=item-types-table]', roles: ROLES },
  { name: 'productions', path: () => '/productions', ready: '[data-testid=productions-table]', roles: ROLES },
  { name: 'people', path: () => '/people', ready: '[data-testid=people-table]', roles: PEOPLE_MANAGERS },
  {
    name: 'outgoing mail',
    path: () => '/outbox',
    ready: '[data-testid=outbox-list], [data-testid=outbox-empty]',
    roles: OUTBOX_READERS,
  },
  { name: 'venue settings', path: () => '/venue', ready: '[data-testid=venue-form]', roles: INVENTORY_EDITORS },
  { name: 'not found', path: () => '/no-such-page', ready: 'main h1' },
  { name: 'not found (signed in)', path: () => '/no-such-page', ready: 'main h1', roles: ROLES },
]
