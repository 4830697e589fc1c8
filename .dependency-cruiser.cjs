/**
 * Import rules of gradus, checked in CI (`npm run check:layers`). The layers, bottom up:
 *   core (arithmetic, errors, JSON, provenance) and version.ts
 *   objects/, statistics/ (the plug-ins; they see the plug-in shapes of src/enumerate/plugin.ts)
 *   engines: src/enumerate, src/symfun, src/modules, src/series, src/pool
 *   src/requests (the request model over the engines)   src/store (the catalogue)
 *   src/cluster (sharded runs: over requests and store; only src/cli imports it)
 *   src/match (search over the store, targets from requests)
 *   src/sweep (scans of seed families; beside src/match, below export; only the front ends import it)
 *   src/export
 *   front ends: src/ui, src/cli (only src/cli and bin/ import src/cli)
 * A module may import its own layer and the layers below; never a layer above, and no cycles.
 */
const ENGINES = '^src/(enumerate|symfun|modules|series|pool)/';
module.exports = {
  forbidden: [
    { name: 'no-cycles', severity: 'error', comment: 'import cycles hide the layering', from: {}, to: { circular: true } },
    { name: 'core-is-the-bottom', severity: 'error', from: { path: '^src/(core/|version\\.ts)' }, to: { path: '^(src/(?!core/|version\\.ts)|objects/|statistics/)' } },
    {
      name: 'plug-ins-see-only-core-and-plug-in-shapes',
      severity: 'error',
      from: { path: '^(objects|statistics)/' },
      to: { path: '^src/(?!core/|enumerate/plugin\\.ts|version\\.ts)' },
    },
    { name: 'engines-below-requests-store-match', severity: 'error', from: { path: ENGINES }, to: { path: '^src/(requests|store|match|export|cli|ui)/' } },
    { name: 'requests-below-store-match', severity: 'error', from: { path: '^src/requests/' }, to: { path: '^src/(store|match|export|cli|ui)/' } },
    { name: 'store-below-match', severity: 'error', from: { path: '^src/store/' }, to: { path: '^src/(requests|match|export|cli|ui)/' } },
    { name: 'match-below-export', severity: 'error', from: { path: '^src/match/' }, to: { path: '^src/(export|cli|ui)/' } },
    { name: 'sweep-below-export', severity: 'error', from: { path: '^src/sweep/' }, to: { path: '^src/(export|cli|ui)/' } },
    { name: 'only-front-ends-import-the-sweep', severity: 'error', from: { pathNot: '^(src/(sweep|cli|ui)/|bin/)' }, to: { path: '^src/sweep/' } },
    { name: 'export-below-front-ends', severity: 'error', from: { path: '^src/export/' }, to: { path: '^src/(cli|ui)/' } },
    { name: 'cluster-over-requests-and-store', severity: 'error', from: { path: '^src/cluster/' }, to: { path: '^src/(match|export|cli|ui)/' } },
    { name: 'only-the-cli-imports-the-cluster', severity: 'error', from: { pathNot: '^(src/cli/|src/cluster/)' }, to: { path: '^src/cluster/' } },
    { name: 'only-the-cli-imports-the-cli', severity: 'error', from: { pathNot: '^(src/cli/|bin/)' }, to: { path: '^src/cli/' } },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    // type-only imports count: a type from a higher layer is still a dependency upwards
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    exclude: { path: '^(test|bench)/' },
  },
};
