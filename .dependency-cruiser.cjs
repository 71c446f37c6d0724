/**
 * The boundaries the code keeps (DEVELOPERS.md, "Layers and boundaries"); `npm run boundaries`, run by
 * `npm test` beside the lint. SQL outside repositories is a lint rule (eslint.config.js), since it is
 * about calls, not imports.
 */
const feature = (side) => `^${side}/features/([^/]+)/`;
const othersInternals = (side) => ({
  path: `^${side}/features/[^/]+/`,
  pathNot: [`^${side}/features/$1/`, `^${side}/features/[^/]+/index\\.tsx?$`],
});

module.exports = {
  forbidden: [
    {
      name: 'feature-internals',
      comment: "A feature imports another feature only through that feature's index.ts, its public module.",
      severity: 'error',
      from: { path: feature('server') },
      to: othersInternals('server'),
    },
    {
      name: 'client-feature-internals',
      comment: "A client feature imports another only through that feature's index.ts.",
      severity: 'error',
      from: { path: feature('src') },
      to: othersInternals('src'),
    },
    {
      name: 'routes-call-services',
      comment: 'Routes translate HTTP and call a service; they never reach a repository themselves.',
      severity: 'error',
      from: { path: '\\.routes\\.ts$' },
      to: { path: '\\.repository\\.ts$' },
    },
    {
      name: 'layers-point-down',
      comment: 'Repositories and services never import routes; repositories never import services.',
      severity: 'error',
      from: { path: '\\.(repository|service)\\.ts$' },
      to: { path: '\\.routes\\.ts$' },
    },
    {
      name: 'repositories-hold-sql-only',
      severity: 'error',
      from: { path: '\\.repository\\.ts$' },
      to: { path: '\\.service\\.ts$' },
    },
    {
      name: 'shared-is-pure',
      comment: 'shared/ runs on both sides: it imports neither the server nor the client.',
      severity: 'error',
      from: { path: '^shared/' },
      to: { path: '^(server|src)/' },
    },
    {
      name: 'sides-stay-apart',
      comment: 'The client and the server meet only in shared/ (contracts and schemas).',
      severity: 'error',
      from: { path: '^src/' },
      to: { path: '^server/' },
    },
    {
      name: 'server-not-client',
      severity: 'error',
      from: { path: '^server/' },
      to: { path: '^src/' },
    },
    {
      name: 'features-not-app',
      comment: 'src/app composes the features; features never import it.',
      severity: 'error',
      from: { path: '^src/(features|components|lib)/' },
      to: { path: '^src/app/' },
    },
    {
      name: 'ui-has-no-features',
      comment: 'UI primitives know nothing of features.',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: '^src/features/' },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '(^|/)(node_modules|dist)/|\\.test\\.tsx?$' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.base.json' },
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default'],
      extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'],
    },
    reporterOptions: { text: { highlightFocused: true } },
  },
};
