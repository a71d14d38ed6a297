/**
 * The layering rule (README, "How it is built"), checked by `npm test` and tests/unit/layers.test.ts.
 *   pure lib:    everything under lib/ except the server glue below. Imports nothing of ours outside it.
 *   server glue: lib/server/, the route wrapper lib/api/route.ts and the session look-ups in lib/auth. May use db/.
 *   db:          imports pure lib only.
 * Imports point one way: app -> components / canvas -> pure lib, and app -> server glue -> db -> pure lib.
 */
const GLUE = '^lib/server/|^lib/api/route[.]ts$|^lib/auth/(current-user|options|session-claims)[.]ts$';
const OURS_OUTSIDE_LIB = '^(app|canvas|components|db|migrations|scripts|tests|types)/|^proxy[.]ts$';

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-cycles',
      comment: 'A cycle (type-only imports included) means two modules are one idea or the layers leak.',
      severity: 'error',
      from: {},
      to: { circular: true },
    },
    {
      name: 'lib-pure-stays-pure',
      comment: 'Pure lib (engine, scene model, units, formatting, domain words) imports nothing of ours outside pure lib.',
      severity: 'error',
      from: { path: '^lib/', pathNot: GLUE },
      to: { path: [OURS_OUTSIDE_LIB, GLUE] },
    },
    {
      name: 'db-uses-pure-lib-only',
      comment: 'The data layer builds on pure lib; it never reaches up into server glue, the UI or the app.',
      severity: 'error',
      from: { path: '^(db|migrations)/' },
      to: { path: ['^(app|canvas|components|scripts|tests)/', GLUE] },
    },
    {
      name: 'no-ui-below-app',
      comment: 'No lib or db file imports the editor (canvas/) or the React components.',
      severity: 'error',
      from: { path: '^(lib|db)/' },
      to: { path: '^(canvas|components|app)/' },
    },
  ],
  options: {
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '^(node_modules|[.]next|data|test-results|playwright-report)/' },
    enhancedResolveOptions: { exportsFields: ['exports'], conditionNames: ['import', 'require', 'node', 'default', 'types'], extensions: ['.ts', '.tsx', '.js', '.mjs', '.cjs', '.json'] },
    moduleSystems: ['es6', 'cjs'],
  },
};
