import type { RouteRecordRaw } from 'vue-router'
// The shell imports single schema files, not the index: the index would load every schema before sign-in.
import { INVENTORY_EDITORS, OUTBOX_READERS, PEOPLE_MANAGERS, ROLES, type Role } from '../../shared/schemas/role.js'

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without signing in. */
    public?: boolean
    /** Roles that may open the page; absent on public pages. */
    roles?: readonly Role[]
    title?: string
  }
}

const everyone: readonly Role[] = ROLES

/** Where a person lands after signing in. */
export const homeFor = (role: Role | undefined) => ({ name: role === 'stage-manager' ? 'board' : 'linesets-list' })

export const routes: RouteRecordRaw[] = [
  {
    path: '/sign-in',
    name: 'session-sign-in',
    component: () => import('../views/SessionSignInView.vue'),
    meta: { public: true, title: 'Sign in' },
  },
  {
    path: '/invitation/:token',
    name: 'invitation-accept',
    component: () => import('../views/InvitationAcceptView.vue'),
    props: true,
    meta: { public: true, title: 'Invitation' },
  },
  // The stage manager starts at the board, everyone else at the linesets: the guard sends each on once the
  // session is known (a redirect here would run before it is).
  { path: '/', name: 'home', component: () => import('../views/LinesetsListView.vue'), meta: { roles: everyone } },
  {
    path: '/board',
    name: 'board',
    component: () => import('../views/BoardView.vue'),
    meta: { roles: everyone, title: 'Board' },
  },
  {
    path: '/linesets',
    name: 'linesets-list',
    component: () => import('../views/LinesetsListView.vue'),
    meta: { roles: everyone, title: 'Linesets' },
  },
  {
    path: '/linesets/new',
    name: 'lineset-new',
    component: () => import('../views/LinesetEditView.vue'),
    meta: { roles: INVENTORY_EDITORS, title: 'New lineset' },
  },
  {
    path: '/linesets/:id',
    name: 'lineset-detail',
    component: () => import('../views/LinesetEditView.vue'),
    props: true,
    meta: { roles: everyone, title: 'Lineset' },
  },
  {
    // `?left=&right=` name the two revisions compared; the hang editor links here after a stale save.
    path: '/linesets/:id/history',
    name: 'lineset-history',
    component: () => import('../views/LinesetHistoryView.vue'),
    props: true,
    meta: { roles: everyone, title: 'Lineset history' },
  },
  {
    path: '/bricks',
    name: 'brick-types-list',
    component: () => import('../views/BrickTypesListView.vue'),
    meta: { roles: everyone, title: 'Bricks' },
  },
  {
    path: '/people',
    name: 'people-list',
    component: () => import('../views/PeopleListView.vue'),
    meta: { roles: PEOPLE_MANAGERS, title: 'People' },
  },
  {
    path: '/outbox',
    name: 'outbox-list',
    component: () => import('../views/OutboxListView.vue'),
    meta: { roles: OUTBOX_READERS, title: 'Outgoing mail' },
  },
  {
    path: '/tickets',
    name: 'tickets-list',
    component: () => import('../views/TicketsListView.vue'),
    meta: { roles: everyone, title: 'Change tickets' },
  },
  {
    // The link in every ticket e-mail.
    path: '/tickets/:id',
    name: 'ticket-detail',
    component: () => import('../views/TicketDetailView.vue'),
    props: true,
    meta: { roles: everyone, title: 'Change ticket' },
  },
  {
    path: '/venue',
    name: 'venue-settings',
    component: () => import('../views/VenueSettingsView.vue'),
    meta: { roles: INVENTORY_EDITORS, title: 'Venue settings' },
  },
  {
    path: '/item-library',
    name: 'item-types-list',
    component: () => import('../views/ItemTypesListView.vue'),
    meta: { roles: everyone, title: 'Item library' },
  },
  {
    path: '/productions',
    name: 'productions-list',
    component: () => import('../views/ProductionsListView.vue'),
    meta: { roles: everyone, title: 'Productions' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('../views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
]
