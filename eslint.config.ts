// ESLint flat config: Vue + TypeScript presets, plus the purity rule for the theory core.
import pluginVue from 'eslint-plugin-vue'
import { withVueTs, vueTsConfigs } from '@vue/eslint-config-typescript'
import globals from 'globals'

const IMPURE_MODULES = [
  'vue',
  'vue-router',
  'pinia',
  'vuetify',
  'vuetify/*',
  'tone',
  'express',
  'knex',
  'pg',
  'node:*',
  'fs',
  'path',
  'http',
  'crypto',
  '@/api/*',
  '@/stores/*',
  '@/components/*',
  '../server/*',
]

export default withVueTs(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', '.test-output/**', 'coverage/**'] },
  pluginVue.configs['flat/essential'],
  vueTsConfigs.recommended,
  {
    files: ['server/**', 'db/**', 'scripts/**', 'tests/**', '*.config.ts'],
    languageOptions: { globals: globals.node },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
      // Vuetify's data-table slots are named item.<key>.
      'vue/valid-v-slot': ['error', { allowModifiers: true }],
    },
  },
  {
    // The theory core and the listening core are pure: no I/O, UI, or server imports, so they run
    // anywhere (the listening core also in an AudioWorklet and in Node).
    files: ['src/theory/**/*.ts', 'src/listen/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: IMPURE_MODULES,
              message: 'src/theory and src/listen/*.ts stay pure (no I/O, UI or server imports).',
            },
          ],
        },
      ],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'fetch', 'localStorage'],
    },
  },
)
