/**
 * Sweep: a family of seeds in the options of `gradus sweep run`, run with a progress bar, the
 * modules left and an estimate of the time left; the seeds ranked by what is remarkable, the
 * findings of the selected one with what was verified where; one of its modules opened as a
 * Hilbert table with its checks (and added to the session); the findings table exported.
 */
import { Box, Text } from 'ink';
import { useState } from 'react';
import { Poly } from '../../core/poly.js';
import { qSeries } from '../../series/series.js';
import { makeTarget } from '../../series/target.js';
import { countsText, rowKindsText, rowPlacesText, SWEEP_EXPORT_FORMATS, type SweepRow } from '../../sweep/index.js';
import { LineInput } from '../components/LineInput.js';
import { ProgressBar } from '../components/ProgressBar.js';
import { ShadedGrid } from '../components/ShadedGrid.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { moduleOutcome } from '../engines/moduleView.js';
import { tableOf } from '../engines/moduleTypes.js';
import { checkSweepLine, DEFAULT_SWEEP, exportSweep, startSweep, SWEEP_PRESETS, type SweepOutcome } from '../engines/sweep.js';
import { errorText } from '../errorText.js';
import { useKeys, useTicker } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { ModuleFindings } from './ModuleFindings.js';

const FINDING_LINES = 5;

/** Σ dim q^{x-degree} of a module document, for a search target. */
function byX(doc: Record<string, unknown>): Poly {
  const coeffs: bigint[] = [];
  for (const c of moduleOutcome(doc).cells) coeffs[c.exps[0] ?? 0] = (coeffs[c.exps[0] ?? 0] ?? 0n) + BigInt(c.dim);
  return Poly.fromQCoeffs(Array.from(coeffs, (v) => v ?? 0n));
}

export function SweepScreen(props: ScreenProps) {
  const theme = useTheme();
  const [line, setLine] = useState(DEFAULT_SWEEP);
  const [draft, setDraft] = useState(line);
  const [field, setField] = useEditField<'sweep'>(props.active, props.setEditing);
  const job = useJob<SweepOutcome>();
  const [sel, setSel] = useState(0);
  const [open, setOpen] = useState<{ row: number; place: number } | undefined>(undefined);
  const [format, setFormat] = useState(0);
  const now = useTicker(job.state.status === 'running');
  const outcome = job.state.result;
  const rows: readonly SweepRow[] = outcome?.doc.rows.filter((r) => r.places.length > 0) ?? [];
  const row = rows[Math.min(sel, rows.length - 1)];

  const start = (text: string) => {
    try {
      checkSweepLine(text);
    } catch (e) {
      return props.notify(errorText(e), 'error');
    }
    setOpen(undefined);
    job.run(
      (onProgress) => startSweep(text, onProgress, existingCatalogue(props.env, props.cwd)),
      (r) => {
        setSel(0);
        props.notify(`sweep:${r.doc.id}: ${r.doc.rows.filter((x) => x.places.length).length} seeds ranked${r.catalogue ? `, kept in ${r.catalogue}` : ' (no catalogue: nothing kept; gradus catalogue build creates one)'}`);
      },
    );
  };

  const openModule = (place: number) => {
    if (!outcome || !row) return;
    const p = row.places[(place + row.places.length) % row.places.length]!;
    const doc = outcome.modules[p.key];
    if (!doc) return props.notify('that module is not at hand', 'error');
    setOpen({ row: rows.indexOf(row), place: row.places.indexOf(p) });
    const view = moduleOutcome(doc);
    props.addItem({ title: `module ${view.title}`, origin: 'module', payload: view });
  };

  const sendToSearch = () => {
    if (!outcome || !row) return props.notify('run a sweep first (Enter)', 'error');
    const entries = row.places.flatMap((p) => {
      const doc = outcome.modules[p.key];
      return doc ? [{ n: p.n, ...(p.k !== undefined ? { k: p.k } : {}), series: qSeries(byX(doc)) }] : [];
    });
    const title = `Hilbert series by x-degree of ${row.seed} under ${row.ops.join(',')}, ${rowPlacesText(row)}`;
    props.addItem({ title, origin: 'module', target: makeTarget(title, entries) });
    props.go('search');
  };

  const write = (force: boolean) => {
    if (!outcome) return props.notify('run a sweep first (Enter)', 'error');
    try {
      const path = exportSweep(outcome.doc, SWEEP_EXPORT_FORMATS[format]!, props.cwd, force);
      props.notify(`written ${path}`);
    } catch (e) {
      props.notify(errorText(e), 'error');
    }
  };

  useKeys(
    (input, key) => {
      if (open) {
        if (key.escape || input === 'o') return setOpen(undefined);
        if (key.leftArrow || key.rightArrow) return openModule(open.place + (key.leftArrow ? -1 : 1));
        return;
      }
      if (key.return) return start(line);
      if (input === 'e') {
        setDraft(line);
        return setField('sweep');
      }
      if (input === 'x') {
        if (job.state.status === 'running') {
          job.cancel();
          props.notify('sweep cancelled: the modules finished so far are kept; Enter resumes it');
        }
        return;
      }
      if (input === 's') return setLine(SWEEP_PRESETS[(SWEEP_PRESETS.indexOf(line) + 1) % SWEEP_PRESETS.length]!);
      if (input === 'f') return setFormat((f) => (f + 1) % SWEEP_EXPORT_FORMATS.length);
      if (input === 'w' || input === 'W') return write(input === 'W');
      if (input === 'o') return openModule(0);
      if (input === 'g') return sendToSearch();
      const page = Math.max(1, props.height - 4 - FINDING_LINES);
      if (key.upArrow) setSel((s) => Math.max(0, s - 1));
      if (key.downArrow) setSel((s) => Math.min(Math.max(0, rows.length - 1), s + 1));
      if (key.pageUp) setSel((s) => Math.max(0, s - page));
      if (key.pageDown) setSel((s) => Math.min(Math.max(0, rows.length - 1), s + page));
    },
    props.active && field === undefined,
  );

  const st = job.state;
  const w = props.width;
  const status =
    st.status === 'running' ? (
      <ProgressBar state={{ label: `sweep ${st.progress?.label ?? 'planning'}`, done: st.progress?.done ?? 0, total: st.progress?.total, elapsedMs: now - st.startedAt }} width={w} />
    ) : st.status === 'error' ? (
      <Text wrap="truncate" {...theme.style('error')}>✗ {st.error}</Text>
    ) : st.status === 'cancelled' ? (
      <Text wrap="truncate" {...theme.style('warn')}>Cancelled: the modules finished so far are kept in the catalogue; Enter resumes the sweep.</Text>
    ) : outcome ? (
      <Text wrap="truncate" {...theme.style('ok')}>sweep:{outcome.doc.id} {countsText(outcome.doc)}</Text>
    ) : (
      <Text wrap="truncate" {...theme.style('dim')}>Enter runs this sweep; e edits it (the options of `gradus sweep run`); s shows another example.</Text>
    );

  const header = field === 'sweep' ? (
    <LineInput
      label="sweep"
      value={draft}
      active
      width={w}
      onChange={setDraft}
      onSubmit={(v) => {
        setLine(v);
        setField(undefined);
        start(v);
      }}
      onLeave={() => setField(undefined)}
    />
  ) : (
    <Text wrap="truncate">
      <Text {...theme.style('dim')}>sweep </Text>
      {line}
    </Text>
  );

  if (open && outcome && rows[open.row]) {
    const r = rows[open.row]!;
    const p = r.places[open.place]!;
    const view = moduleOutcome(outcome.modules[p.key] ?? {});
    const table = tableOf(view);
    return (
      <Box flexDirection="column" width={w}>
        {header}
        <Text wrap="truncate" {...theme.style('accent')}>
          {r.rank}. {r.seed} [{r.ops.join(',')}] at n = {p.n}
          {p.k !== undefined ? `, k = ${p.k}` : ''} ({open.place + 1} of {r.places.length}): dimension {view.dimension}
        </Text>
        <Text wrap="truncate" {...theme.style('dim')}>gradus {p.key}</Text>
        <ShadedGrid table={table} rowLabel={view.axes[1] ?? ''} colLabel={view.axes[0] ?? 'x'} width={w} height={Math.max(3, props.height - 4 - view.findings.length)} />
        <ModuleFindings findings={view.findings} width={w} />
      </Box>
    );
  }

  const listH = Math.max(2, props.height - 3 - FINDING_LINES);
  const first = Math.max(0, Math.min(sel - Math.floor(listH / 2), rows.length - listH));
  return (
    <Box flexDirection="column" width={w}>
      {header}
      {status}
      <Text wrap="truncate" {...theme.style('dim')}>
        {rows.length ? `rank · seed · operators · places · findings   (export: ${SWEEP_EXPORT_FORMATS[format]}, f changes it, w writes)` : ''}
      </Text>
      <Box flexDirection="column" height={listH} overflow="hidden">
        {rows.slice(first, first + listH).map((r, i) => {
          const selected = first + i === sel;
          return (
            <Text key={r.id} wrap="truncate" {...(selected ? theme.style('selected') : {})}>
              {selected && !theme.color ? '▶' : ' '}
              {String(r.rank).padStart(3)}. {r.seed} [{r.ops.join(',')}] {rowPlacesText(r)} — {rowKindsText(r)}
            </Text>
          );
        })}
      </Box>
      <Box flexDirection="column" height={FINDING_LINES} overflow="hidden">
        {row
          ? [
              ...row.findings.slice(0, FINDING_LINES - 1).map((f, i) => (
                <Text key={i} wrap="truncate">
                  <Text {...theme.style('value')}>· </Text>
                  {f.claim}
                  <Text {...theme.style('dim')}> — {f.verified}</Text>
                </Text>
              )),
              <Text key="r" wrap="truncate" {...theme.style('dim')}>
                o opens its module{row.places.length > 1 ? 's (←/→)' : ''}; g searches its Hilbert series; reproduce: {row.reproduce[row.reproduce.length - 1]}
              </Text>,
            ]
          : null}
      </Box>
    </Box>
  );
}
