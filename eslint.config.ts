// ESLint flat config: Vue + TypeScript presets, the purity rules for the theory core and the contract,
// and the boundaries between client, contract, server, db and scripts.
import pluginVue from 'eslint-plugin-vue'
import { withVueTs, vueTsConfigs } from '@vue/eslint-config-typescript'
import globals from 'globals'
import type { Linter } from 'eslint'

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

const restrict = (message: string, regex: string): Linter.RulesRecord => ({
  'no-restricted-imports': ['error', { patterns: [{ regex, message }] }],
})

// Where code may reach (tests/unit/boundaries.test.ts checks the same on resolved paths).
const BOUNDARIES: Linter.Config[] = [
  {
    files: ['src/**/*.ts', 'src/**/*.vue'],
    ignores: ['src/contract/**', 'src/theory/**'],
    rules: restrict(
      'The client never imports server/ (types included): shared shapes live in src/contract.',
      '(^|/)server(/|$)',
    ),
  },
  {
    files: ['server/**/*.ts'],
    rules: restrict(
      'The server takes from src/ only the theory core and the contract, and never imports scripts/.',
      '(^|/)(src/(?!(theory|contract)(/|$))|scripts/)',
    ),
  },
  {
    files: ['db/**/*.ts'],
    rules: restrict('db/ imports no server code.', '(^|/)server(/|$)'),
  },
  {
    files: ['db/migrations/**/*.ts'],
    rules: restrict(
      'A migration is a frozen snapshot: it imports no other migration or helper (inline what it needs).',
      '^\\.',
    ),
  },
  {
    // The contract is pure like the theory core: zod, the theory core and itself.
    files: ['src/contract/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: IMPURE_MODULES, message: 'src/contract must stay pure (zod and src/theory).' },
            {
              regex:
                '^(@/(?!(theory|contract)(/|$))|(\\.\\./)+(api|audio|components|composables|drills|layouts|listen|plans|plugins|router|stores|styles|views)(/|$)|.*(server|scripts)/)',
              message: 'src/contract imports only zod, src/theory and other contract modules.',
            },
          ],
        },
      ],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'fetch', 'localStorage'],
    },
  },
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
  ...BOUNDARIES,
  {
    // Small pieces: no function over 60 lines (tests may hold longer tables).
    files: ['src/**/*.{ts,vue}', 'server/**/*.ts', 'db/**/*.ts', 'scripts/**/*.{ts,mjs}'],
    ignores: ['**/*.test.ts', '**/*.bench.ts'],
    rules: {
      'max-lines-per-function': ['error', { max: 60, skipBlankLines: true, skipComments: true }],
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
