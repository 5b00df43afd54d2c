import { h, type FunctionalComponent } from 'vue'
import type { IconProps, IconSet } from 'vuetify'
import { VSvgIcon } from 'vuetify/components/VIcon'
import { ICON_PATHS } from './iconPaths'

/**
 * Vuetify's default icon set: the `mdi-...` names the views use are looked up in the one map (`iconPaths.ts`)
 * and drawn as inline SVG paths, so only the icons the app uses are bundled (no icon font, no stylesheet).
 */
const PathIcon: FunctionalComponent<IconProps> = (props, { attrs }) => {
  const name = typeof props.icon === 'string' ? props.icon : ''
  const path = ICON_PATHS[name]
  if (!path && import.meta.env.DEV) console.warn(`Icon "${name}" is not in src/plugins/icons/iconPaths.ts`)
  return h(VSvgIcon, { ...attrs, tag: props.tag, icon: path ?? '' })
}
PathIcon.props = ['icon', 'tag']

export const pathIcons: IconSet = { component: PathIcon }
