/**
 * Modules: a request in the command line's own words (seed, n, k, operators), computed in
 * a worker with a progress bar, the engine's estimate and a key to cancel; the Hilbert
 * table as a shaded grid, the Frobenius series of the selected cell, and the findings.
 * Results are kept by request: the screen shows the result of the request above it, or none.
 */
import { Box } from 'ink';
import { useRef, useState } from 'react';
import { Poly } from '../../core/poly.js';
import { qSeries, qtSeries, type Series } from '../../series/series.js';
import { makeTarget } from '../../series/target.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { progressLines } from '../components/ProgressBar.js';
import { gridLines } from '../components/ShadedGrid.js';
import { demoRequest } from '../demo/demoSeed.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { bumpRequestN, DEFAULT_MODULE_REQUEST, MODULE_ENGINE_AVAILABLE, MODULE_PRESETS, startModule, withoutN } from '../engines/modules.js';
import { cellsAt, tableOf, type ModuleOutcome } from '../engines/moduleTypes.js';
import { useKeys, useTicker } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { splitTerms } from '../text/splitTerms.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { useScroll } from '../useScroll.js';

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

const norm = (r: string) => r.trim().replace(/\s+/g, ' ');

export function ModulesScreen(props: ScreenProps) {
  const [request, setRequest] = useState(DEFAULT_MODULE_REQUEST);
  const [field, setField] = useEditField<'request'>(props.active, props.setEditing);
  const job = useJob<ModuleOutcome>('modules');
  const [jobFor, setJobFor] = useState('');
  const [results, setResults] = useState<Record<string, ModuleOutcome>>({});
  const [sel, setSel] = useState<[number, number]>([0, 0]);
  // The first table column shown: kept between draws, so the window moves only to follow the selection.
  const colStart = useRef(0);
  const scroll = useScroll();
  const now = useTicker(job.state.status === 'running');
  const key = norm(request);
  const outcome = results[key];
  const table = outcome ? tableOf(outcome) : undefined;
  const mine = jobFor === key;

  const compute = (text: string) => {
    const k = norm(text);
    setJobFor(k);
    job.run(
      (onProgress) => startModule(text, onProgress, existingCatalogue(props.env, props.cwd)),
      (r) => {
        setResults((m) => ({ ...m, [k]: r }));
        props.addItem({ title: `module ${r.title}`, origin: 'module', payload: r });
        props.notify(`computed: ${r.title}, dimension ${r.dimension}`);
        setSel([0, 0]);
        colStart.current = 0;
      },
    );
  };

  const changeRequest = (text: string) => {
    setRequest(text);
    setSel([0, 0]);
    colStart.current = 0;
    scroll.reset();
  };

  /** The chosen series of one module (a row of its table, or the whole table as q,t). */
  const seriesOf = (o: ModuleOutcome, wholeTable: boolean, row: number): Series => {
    const t = tableOf(o);
    if (wholeTable && o.axes.length > 1) return qtSeries(Poly.fromQTTable((t[0] ?? []).map((_, j) => t.map((r) => r[j] ?? 0n))));
    return qSeries(Poly.fromQCoeffs(t[row] ?? []));
  };

  const sendToSearch = (wholeTable: boolean) => {
    if (!outcome || !table) return props.notify('compute this module first (Enter)', 'error');
    const rowAxis = outcome.axes[1] ?? '';
    const what = wholeTable && outcome.axes.length > 1 ? `Hilbert table (q=${outcome.axes[0]}, t=${rowAxis})` : outcome.axes.length > 1 ? `row ${rowAxis}=${sel[0]} (q=${outcome.axes[0]})` : `Hilbert series (q=${outcome.axes[0]})`;
    // Every n computed for this same request forms the target: the search verifies a
    // match on a family over n, so more sizes make a stronger target.
    const fam = familyKey(key);
    const family = Object.entries(results)
      .filter(([r]) => familyKey(r) === fam)
      .map(([, o]) => o)
      .sort((a, b) => a.n - b.n);
    const members = family.some((m) => m.n === outcome.n) ? family : [outcome];
    const title = `${what} of ${outcome.title.replace(/, n=\d+.*$/, '')}, n = ${members.map((m) => m.n).join(', ')}`;
    const entries = members.map((m) => ({ n: m.n, ...(m.k !== undefined ? { k: m.k } : {}), series: seriesOf(m, wholeTable, sel[0]) }));
    props.addItem({ title, origin: 'module', target: makeTarget(title, entries) });
    props.go('search');
    if (entries.length < 2) props.notify('one size only: compute this request for other n too (+/- then Enter) for a search over n');
  };

  useKeys(
    (input, k) => {
      if (k.return) return compute(request);
      if (input === 'e') return setField('request');
      if (input === 'x') {
        if (job.state.status !== 'running') return props.notify('nothing is running');
        job.cancel();
        return props.notify('computation cancelled');
      }
      if (input === 's') {
        const at = MODULE_PRESETS.indexOf(request);
        return changeRequest(MODULE_PRESETS[(at + 1) % MODULE_PRESETS.length]!);
      }
      if (input === '+' || input === '=' || input === '-') {
        const next = nextSize(request, input === '-' ? -1 : 1);
        if (next === request) return props.notify(/--n\b/.test(request) ? 'n stays from 1 to 10 here (e edits the request)' : 'this request names no --n (e edits it)', 'error');
        return changeRequest(next);
      }
      if (input === 'g') return sendToSearch(false);
      if (input === 'G') return sendToSearch(true);
      if (scroll.handle(input, k, false)) return;
      if (!table) return;
      const rows = table.length;
      const cols = table[0]?.length ?? 1;
      if (k.upArrow) setSel(([r, c]) => [Math.max(0, r - 1), c]);
      if (k.downArrow) setSel(([r, c]) => [Math.min(rows - 1, r + 1), c]);
      if (k.leftArrow) setSel(([r, c]) => [r, Math.max(0, c - 1)]);
      if (k.rightArrow) setSel(([r, c]) => [r, Math.min(cols - 1, c + 1)]);
    },
    props.active && field === undefined,
  );

  const st = job.state;
  const w = props.width;
  const top: SLine[] = field === 'request' ? [] : wrapLine([{ text: 'module ', style: 'dim' }, { text: request }], w, 7);
  const status: SLine[] = [];
  if (!MODULE_ENGINE_AVAILABLE) status.push(...wrapLine(line('The module engine (src/modules) is not available in this build; nothing can be computed here.', 'warn'), w));
  else if (st.status === 'running' && mine) {
    const p = st.progress;
    status.push(...progressLines({ label: p?.label ?? 'starting the engine in a worker thread', done: p?.done ?? 0, total: p?.total, elapsedMs: now - st.startedAt, estimateSeconds: p?.estimateSeconds, sinceEstimateMs: p?.estimatedAt !== undefined ? now - p.estimatedAt : undefined }, w));
  } else if (st.status === 'running') status.push(...wrapLine(line(`computing another request (${jobFor}); x cancels it`, 'dim'), w, 2));
  else if (st.status === 'error' && mine) status.push(...wrapLine(line(`✗ ${st.error}`, 'error'), w, 2));
  else if (st.status === 'cancelled' && mine) status.push(...wrapLine(line(`Cancelled after ${((st.finishedAt - st.startedAt) / 1000).toFixed(1)}s. Enter computes again, e edits the request.`, 'warn'), w, 2));
  if (outcome) status.push(...wrapLine(line(`${outcome.title}: dimension ${outcome.dimension} in ${(outcome.elapsedMs / 1000).toFixed(2)}s; ${outcome.exactness}`, 'ok'), w, 2));
  else if (status.length === 0) status.push(...wrapLine(line('Enter computes this module; e edits the request (the options of `gradus module`); s cycles example seeds.', 'dim'), w, 2));

  const body: SLine[] = [];
  let focus: [number, number] | undefined;
  if (outcome && table) {
    const caption = `Hilbert table: columns ${outcome.axes[0]}-degree${outcome.axes.length > 1 ? `, rows ${outcome.axes[1]}-degree` : ''}${outcome.axes.length > 2 ? ` (summed over ${outcome.axes.slice(2).join(', ')})` : ''}`;
    body.push(...wrapLine(line(caption, 'dim'), w, 2));
    const grid = gridLines({ table, rowLabel: outcome.axes[1] ?? '', colLabel: outcome.axes[0] ?? 'x', selected: sel, width: w, colOffset: colStart.current, sideKeys: '←/→' });
    colStart.current = grid.colStart;
    const selRow = body.length + grid.firstRow + sel[0];
    body.push(...grid.lines);
    const cells = cellsAt(outcome, sel[0], sel[1]);
    const frob = cells.map((c) => c.frobenius).filter((f) => f !== '').join(' + ') || '0';
    const where = `${outcome.axes.length > 1 ? `${outcome.axes[1]}${sel[0]} ` : ''}${outcome.axes[0]}${sel[1]}`;
    body.push(...wrapLine([{ text: 'Frob', style: 'accent' }, { text: `(${where}) `, style: 'dim' }, { text: splitTerms(frob).join(' ') }], w, 4));
    // Keep the selected row in view, with the Frobenius series of its cell when both fit.
    const fitRoom = props.height - top.length - status.length - 2;
    focus = body.length - selRow <= fitRoom ? [selRow, body.length - 1] : [selRow, selRow];
    for (const f of outcome.findings) {
      const mark = f.holds === true ? '✓ holds ' : f.holds === false ? '✗ fails ' : '· n/a   ';
      body.push(...wrapLine([{ text: mark, style: f.holds === true ? 'ok' : f.holds === false ? 'warn' : 'dim' }, { text: f.label }, ...(f.detail ? [{ text: ` — ${f.detail}`, style: 'dim' as const }] : [])], w, 8));
    }
  }
  const room = Math.max(3, props.height - top.length - (field === 'request' ? 1 : 0) - status.length);
  const win = scroll.view(body, room, focus);
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'request' ? (
        <LineInput
          label="module"
          initial={request}
          active
          width={w}
          onSubmit={(v) => {
            setField(undefined);
            changeRequest(v);
            compute(v);
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      <Lines lines={[...status, ...win.lines]} />
    </Box>
  );
}
