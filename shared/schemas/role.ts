/** What a person may do in one venue. */
export const ROLES = ['administrator', 'technical-director', 'fly-operator', 'stage-manager'] as const
export type Role = (typeof ROLES)[number]

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  administrator: 'Administrator',
  'technical-director': 'Technical director',
  'fly-operator': 'Fly operator',
  'stage-manager': 'Stage manager',
}

/** Who may change the rigging inventory (linesets, bricks) and the venue's policies. */
export const INVENTORY_EDITORS: readonly Role[] = ['administrator', 'technical-director']
/** Who may manage people and their roles. */
export const PEOPLE_MANAGERS: readonly Role[] = ['administrator']

export const canEditInventory = (role: Role | undefined) => !!role && INVENTORY_EDITORS.includes(role)
export const canManagePeople = (role: Role | undefined) => !!role && PEOPLE_MANAGERS.includes(role)

/** Who may enter hangs and keep the venue's item library: the fly crew as well as those who approve. */
export const HANG_EDITORS: readonly Role[] = ['administrator', 'technical-director', 'fly-operator']
/** Who may add and change productions. */
export const PRODUCTION_MANAGERS: readonly Role[] = ['administrator', 'technical-director']

export const canEditHangs = (role: Role | undefined) => !!role && HANG_EDITORS.includes(role)
export const canManageProductions = (role: Role | undefined) => !!role && PRODUCTION_MANAGERS.includes(role)

/** Who may record a pre-run check: the stage manager, and those who answer for the rigging. */
export const PRE_RUN_CHECKERS: readonly Role[] = ['administrator', 'technical-director', 'stage-manager']

export const canRecordPreRunCheck = (role: Role | undefined) => !!role && PRE_RUN_CHECKERS.includes(role)
/** Who may read the venue's outgoing mail: it holds invitation links and everyone's addresses. */
export const OUTBOX_READERS: readonly Role[] = ['administrator']
