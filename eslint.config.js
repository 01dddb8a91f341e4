// ESLint checks ONLY module boundaries and import cycles (DESIGN.md § Boundaries); style rules are off.
//   geometry/            imports nothing outside geometry/ (no node:, DOM frameworks, zod, express, pg)
//   src/                 imports from server/ only server/contract
//   src/features/<a>/    does not import src/features/<b>/ (src/app composes features)
//   server/              does not import src/
//   everywhere           no import cycles
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';
import tseslint from 'typescript-eslint';

const root = path.dirname(fileURLToPath(import.meta.url));

/** Feature folders present right now (each gets its own zone). */
function featureDirs() {
  try {
    return readdirSync(path.join(root, 'src', 'features'), { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name);
  } catch {
    return [];
  }
}

const zones = [
  {
    target: './geometry',
    from: ['./src', './server', './tests', './scripts', './drizzle'],
    message: 'geometry/ is pure: it imports nothing outside geometry/.',
  },
  {
    target: './src',
    from: './server',
    except: ['./contract'],
    message: 'src/ may import only server/contract from server/.',
  },
  {
    target: './server',
    from: './src',
    message: 'server/ must not import the client (src/).',
  },
  ...featureDirs().map((name) => ({
    target: `./src/features/${name}`,
    from: './src/features',
    except: [`./${name}`],
    message: 'Features do not import each other; compose them in src/app.',
  })),
];

/** Packages geometry/ must not use (it runs in server, worker and browser alike). */
const geometryForbidden = {
  patterns: [
    { group: ['node:*'], message: 'geometry/ uses no Node APIs.' },
    {
      group: ['react', 'react-*', 'react/*', '@react-three/*', 'three', 'three/*', 'zod', 'express', 'pg', 'drizzle-orm', 'drizzle-orm/*'],
      message: 'geometry/ imports no frameworks, validation, HTTP or database packages.',
    },
  ],
};

export default tseslint.config(
  {
    ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-artifacts/**', 'coverage/**', 'drizzle/**', '**/*.d.ts', '**/*.d.mts'],
  },
  {
    files: ['**/*.{ts,tsx,mts,cts,js,mjs,cjs,jsx}'],
    languageOptions: {
      parser: tseslint.parser,
      ecmaVersion: 'latest',
      sourceType: 'module',
      parserOptions: { ecmaFeatures: { jsx: true } },
    },
    linterOptions: { reportUnusedDisableDirectives: 'off' },
    plugins: { 'import-x': importX, '@typescript-eslint': tseslint.plugin },
    settings: {
      'import-x/extensions': ['.ts', '.tsx', '.mts', '.js', '.mjs', '.jsx'],
      'import-x/resolver-next': [
        createNodeResolver({
          extensions: ['.ts', '.tsx', '.mts', '.d.ts', '.js', '.mjs', '.jsx', '.json'],
          extensionAlias: { '.js': ['.ts', '.tsx', '.d.ts', '.js'], '.mjs': ['.mts', '.d.mts', '.mjs'] },
        }),
      ],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    files: ['geometry/**/*.{ts,tsx}'],
    ignores: ['geometry/**/*.test.ts'],
    rules: { 'no-restricted-imports': ['error', geometryForbidden] },
  },
);
