import {
  mdiAlertCircle,
  mdiArrowDown,
  mdiArrowUp,
  mdiCached,
  mdiCheck,
  mdiCheckboxBlankOutline,
  mdiCheckboxMarked,
  mdiCheckCircle,
  mdiChevronDown,
  mdiChevronLeft,
  mdiChevronRight,
  mdiChevronUp,
  mdiCircle,
  mdiClose,
  mdiCloseCircle,
  mdiInformation,
  mdiMenu,
  mdiMenuDown,
  mdiMinusBox,
  mdiPageFirst,
  mdiPageLast,
  mdiPaperclip,
  mdiPencil,
  mdiRadioboxBlank,
  mdiRadioboxMarked,
  mdiUnfoldMoreHorizontal,
} from '@mdi/js'
import type { IconAliases } from 'vuetify'

const svg = (path: string) => `svg:${path}`

/**
 * The icons Vuetify's own components ask for by alias (`$close`, `$dropdown`, ...), drawn as the same Material
 * Design paths as Vuetify's own SVG icon set (vuetify/iconsets/mdi-svg), but only for the components the client
 * uses: that set also carries the rating, date, colour, tree, media and key-cap icons (about 1.6 KB compressed,
 * loaded on every page). A Vuetify component added later that asks for an alias missing here draws an empty icon:
 * add the alias with it (tests/unit/vuetify-aliases.test.ts names such a component).
 */
export const vuetifyAliases: Partial<IconAliases> = {
  collapse: svg(mdiChevronUp),
  complete: svg(mdiCheck),
  cancel: svg(mdiCloseCircle),
  close: svg(mdiClose),
  delete: svg(mdiCloseCircle),
  clear: svg(mdiCloseCircle),
  success: svg(mdiCheckCircle),
  info: svg(mdiInformation),
  warning: svg(mdiAlertCircle),
  error: svg(mdiCloseCircle),
  prev: svg(mdiChevronLeft),
  next: svg(mdiChevronRight),
  checkboxOn: svg(mdiCheckboxMarked),
  checkboxOff: svg(mdiCheckboxBlankOutline),
  checkboxIndeterminate: svg(mdiMinusBox),
  delimiter: svg(mdiCircle),
  sortAsc: svg(mdiArrowUp),
  sortDesc: svg(mdiArrowDown),
  expand: svg(mdiChevronDown),
  menu: svg(mdiMenu),
  subgroup: svg(mdiMenuDown),
  dropdown: svg(mdiMenuDown),
  radioOn: svg(mdiRadioboxMarked),
  radioOff: svg(mdiRadioboxBlank),
  edit: svg(mdiPencil),
  loading: svg(mdiCached),
  first: svg(mdiPageFirst),
  last: svg(mdiPageLast),
  unfold: svg(mdiUnfoldMoreHorizontal),
  file: svg(mdiPaperclip),
  tableGroupExpand: svg(mdiChevronRight),
  tableGroupCollapse: svg(mdiChevronDown),
}
