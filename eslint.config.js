// ESLint as the official Vue scaffold sets it up: Vue's essential rules, typescript-eslint's recommended
// rules for .ts and .vue files, and formatting left to Prettier (`npm run format:check`).
import { globalIgnores } from 'eslint/config'
import { defineConfigWithVueTs, vueTsConfigs } from '@vue/eslint-config-typescript'
import pluginVue from 'eslint-plugin-vue'
import skipFormatting from '@vue/eslint-config-prettier/skip-formatting'

export default defineConfigWithVueTs(
  { name: 'app/files-to-lint', files: ['**/*.{ts,mts,tsx,vue,js,mjs}'] },
  globalIgnores(['**/dist/**', '**/node_modules/**', '**/.data/**', 'tests/artifacts/**', 'public/**']),
  pluginVue.configs['flat/essential'],
  vueTsConfigs.recommended,
  {
    name: 'app/rules',
    rules: {
      // Unused names fail the build; a leading underscore marks one kept on purpose.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  skipFormatting,
)
