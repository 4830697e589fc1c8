/**
 * Modules: a request in the command line's own words (seed, n, k, operators), computed in
 * a worker with a progress bar, an estimate of the time left and a key to cancel; the
 * Hilbert table as a shaded grid, the Frobenius series of the selected cell, and the
 * findings.
 */
import { Box, Text } from 'ink';
import { useRef, useState } from 'react';
import { Poly } from '../../core/poly.js';
import { qSeries, qtSeries, type Series } from '../../series/series.js';
import { makeTarget } from '../../series/target.js';
import { LineInput } from '../components/LineInput.js';
import { ProgressBar } from '../components/ProgressBar.js';
import { ShadedGrid } from '../components/ShadedGrid.js';
import { bumpRequestN, withoutN, DEFAULT_MODULE_REQUEST, MODULE_ENGINE_AVAILABLE, MODULE_PRESETS, startModule } from '../engines/modules.js';
import { cellsAt, tableOf, type ModuleOutcome } from '../engines/moduleTypes.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { useTicker, useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';
import { demoRequest } from '../demo/demoSeed.js';
import { useJob } from '../useJob.js';
import { ModuleFindings } from './ModuleFindings.js';

/** Requests of one family over n share this key (the demo's seed family, or equal up to --n). */
function familyKey(request: string): string {
  for (let n = 1; n <= 10; n++) if (request === demoRequest(n)) return 'demo seed family';
  return withoutN(request);
}

/** The request at n ± 1; the demo's seed family keeps its shape (staircase, θ on the last variable). */
function nextSize(request: string, delta: number): string {
  for (let n = 1; n <= 10; n++) {
    if (request === demoRequest(n)) return demoRequest(Math.min(10, Math.max(2, n + delta)));
  }
  return bumpRequestN(request, delta);
}

export function ModulesScreen(props: ScreenProps) {
  const theme = useTheme();
  const [request, setRequest] = useState(DEFAULT_MODULE_REQUEST);
  const [draft, setDraft] = useState(request);
  const [field, setField] = useEditField<'request'>(props.active, props.setEditing);
  const job = useJob<ModuleOutcome>();
  const [sel, setSel] = useState<[number, number]>([0, 0]);
  const now = useTicker(job.state.status === 'running');
  const outcome = job.state.result;
  const table = outcome ? tableOf(outcome) : undefined;

  // Modules computed so far, by request without its --n, then by n.
  const computed = useRef(new Map<string, Map<number, ModuleOutcome>>());
  const compute = (line: string) => {
    job.run(
      (onProgress) => startModule(line, onProgress, existingCatalogue(props.env, props.cwd)),
      (r) => {
        const key = familyKey(line);
        if (!computed.current.has(key)) computed.current.set(key, new Map());
        computed.current.get(key)!.set(r.n, r);
        props.addItem({ title: `module ${r.title}`, origin: 'module', payload: r });
        props.notify(`computed: ${r.title}, dimension ${r.dimension}`);
        setSel([0, 0]);
      },
    );
  };

  /** The chosen series of one module (a row of its table, or the whole table as q,t). */
  const seriesOf = (o: ModuleOutcome, wholeTable: boolean, row: number): Series => {
    const t = tableOf(o);
    if (wholeTable && o.axes.length > 1) return qtSeries(Poly.fromQTTable((t[0] ?? []).map((_, j) => t.map((r) => r[j] ?? 0n))));
    return qSeries(Poly.fromQCoeffs(t[row] ?? []));
  };

  const sendToSearch = (wholeTable: boolean) => {
    if (!outcome || !table) return props.notify('compute a module first (Enter)', 'error');
    const rowAxis = outcome.axes[1] ?? '';
    const what = wholeTable && outcome.axes.length > 1 ? `Hilbert table (q=${outcome.axes[0]}, t=${rowAxis})` : outcome.axes.length > 1 ? `row ${rowAxis}=${sel[0]} (q=${outcome.axes[0]})` : `Hilbert series (q=${outcome.axes[0]})`;
    // Every n computed for this same request forms the target: the search verifies a
    // match on a family over n, so more sizes make a stronger target.
    const family = [...(computed.current.get(familyKey(request)) ?? new Map<number, ModuleOutcome>()).values()].sort((a, b) => a.n - b.n);
    const members = family.some((m) => m.n === outcome.n) ? family : [outcome];
    const title = `${what} of ${outcome.title.replace(/, n=\d+.*$/, '')}, n = ${members.map((m) => m.n).join(', ')}`;
    const entries = members.map((m) => ({ n: m.n, ...(m.k !== undefined ? { k: m.k } : {}), series: seriesOf(m, wholeTable, sel[0]) }));
    props.addItem({ title, origin: 'module', target: makeTarget(title, entries) });
    props.go('search');
    if (entries.length < 2) props.notify('one size only: compute this request for other n too (+/- then Enter) for a search over n');
  };


  useKeys(
    (input, key) => {
      if (key.return) return compute(request);
      if (input === 'e') {
        setDraft(request);
        return setField('request');
      }
      if (input === 'x') {
        if (job.state.status === 'running') {
          job.cancel();
          props.notify('computation cancelled');
        }
        return;
      }
      if (input === 's') {
        const at = MODULE_PRESETS.indexOf(request);
        return setRequest(MODULE_PRESETS[(at + 1) % MODULE_PRESETS.length]!);
      }
      if (input === '+' || input === '=' || input === '-') return setRequest(nextSize(request, input === '-' ? -1 : 1));
      if (input === 'g') return sendToSearch(false);
      if (input === 'G') return sendToSearch(true);
      if (!table) return;
      const rows = table.length;
      const cols = table[0]?.length ?? 1;
      if (key.upArrow) setSel(([r, c]) => [Math.max(0, r - 1), c]);
      if (key.downArrow) setSel(([r, c]) => [Math.min(rows - 1, r + 1), c]);
      if (key.leftArrow) setSel(([r, c]) => [r, Math.max(0, c - 1)]);
      if (key.rightArrow) setSel(([r, c]) => [r, Math.min(cols - 1, c + 1)]);
    },
    props.active && field === undefined,
  );

  const st = job.state;
  const w = props.width;
  const selCells = outcome ? cellsAt(outcome, sel[0], sel[1]) : [];
  const frob = selCells.map((c) => c.frobenius).filter((f) => f !== '').join(' + ') || '0';
  const findingsH = outcome ? Math.min(outcome.findings.length, Math.max(2, props.height - 12)) : 0;
  const frobH = props.height >= 24 ? 3 : 2;
  const gridH = Math.max(3, props.height - 4 - frobH - findingsH);
  return (
    <Box flexDirection="column">
      {field === 'request' ? (
        <LineInput
          label="module"
          value={draft}
          active
          width={w}
          onChange={setDraft}
          onSubmit={(v) => {
            setRequest(v);
            setField(undefined);
            compute(v);
          }}
          onLeave={() => setField(undefined)}
        />
      ) : (
        <Text wrap="truncate">
          <Text {...theme.style('dim')}>module </Text>
          {request}
        </Text>
      )}
      {!MODULE_ENGINE_AVAILABLE ? (
        <Text wrap="wrap" {...theme.style('warn')}>
          The module engine (src/modules) is not available in this build; nothing can be computed here.
        </Text>
      ) : st.status === 'running' ? (
        <ProgressBar state={{ label: st.progress?.label ?? 'starting', done: st.progress?.done ?? 0, total: st.progress?.total, elapsedMs: now - st.startedAt }} width={w} />
      ) : st.status === 'error' ? (
        <Text wrap="truncate" {...theme.style('error')}>
          ✗ {st.error}
        </Text>
      ) : st.status === 'cancelled' ? (
        <Text wrap="truncate" {...theme.style('warn')}>
          Cancelled after {((st.finishedAt - st.startedAt) / 1000).toFixed(1)}s. Enter computes again, e edits the request.
        </Text>
      ) : outcome ? (
        <Text wrap="truncate" {...theme.style('ok')}>
          {outcome.title}: dimension {outcome.dimension} in {(outcome.elapsedMs / 1000).toFixed(2)}s; {outcome.exactness}
        </Text>
      ) : (
        <Text wrap="truncate" {...theme.style('dim')}>
          Enter computes this module; e edits the request (the options of `gradus module`).
        </Text>
      )}
      {outcome && table ? (
        <>
          <Text wrap="truncate" {...theme.style('dim')}>
            Hilbert table: columns {outcome.axes[0]}-degree{outcome.axes.length > 1 ? `, rows ${outcome.axes[1]}-degree` : ''}
            {outcome.axes.length > 2 ? ` (summed over ${outcome.axes.slice(2).join(', ')})` : ''}
          </Text>
          <ShadedGrid table={table} rowLabel={outcome.axes[1] ?? ''} colLabel={outcome.axes[0] ?? 'x'} selected={sel} width={w} height={gridH} />
          <Box height={frobH} overflow="hidden">
          <Text wrap="wrap">
            <Text {...theme.style('accent')}>Frob</Text>
            <Text {...theme.style('dim')}>({outcome.axes.length > 1 ? `${outcome.axes[1]}${sel[0]} ` : ''}{outcome.axes[0]}{sel[1]}) </Text>
            {frob}
          </Text>
          </Box>
          <ModuleFindings findings={outcome.findings.slice(0, findingsH)} width={w} />
        </>
      ) : null}
    </Box>
  );
}
