/**
 * Sweep: a family of seeds in the options of `gradus sweep run`, run with a progress bar, the
 * modules left and an estimate of the time left; the seeds ranked by what is remarkable, the
 * findings of the selected one with what was verified where; one of its modules opened as a
 * Hilbert table with its checks (and added to the session); the findings table exported.
 */
import { Box } from 'ink';
import { useState } from 'react';
import { Poly } from '../../core/poly.js';
import { qSeries } from '../../series/series.js';
import { makeTarget } from '../../series/target.js';
import { countsText, rowKindsText, rowPlacesText, SWEEP_EXPORT_FORMATS, type SweepRow } from '../../sweep/index.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { progressLines } from '../components/ProgressBar.js';
import { gridLines } from '../components/ShadedGrid.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { moduleOutcome } from '../engines/moduleView.js';
import { tableOf } from '../engines/moduleTypes.js';
import { checkSweepLine, DEFAULT_SWEEP, exportSweep, startSweep, SWEEP_PRESETS, type SweepOutcome } from '../engines/sweep.js';
import { errorText } from '../errorText.js';
import { useKeys, useTicker } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { useScroll } from '../useScroll.js';

/** Σ dim q^{x-degree} of a module document, for a search target. */
function byX(doc: Record<string, unknown>): Poly {
  const coeffs: bigint[] = [];
  for (const c of moduleOutcome(doc).cells) coeffs[c.exps[0] ?? 0] = (coeffs[c.exps[0] ?? 0] ?? 0n) + BigInt(c.dim);
  return Poly.fromQCoeffs(Array.from(coeffs, (v) => v ?? 0n));
}

export function SweepScreen(props: ScreenProps) {
  const [sweepLine, setSweepLine] = useState(DEFAULT_SWEEP);
  const [field, setField] = useEditField<'sweep'>(props.active, props.setEditing);
  const job = useJob<SweepOutcome>();
  const scroll = useScroll();
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
      if (key.return) return start(sweepLine);
      if (input === 'e') return setField('sweep');
      if (input === 'x') {
        if (job.state.status === 'running') {
          job.cancel();
          props.notify('sweep cancelled: the modules finished so far are kept; Enter resumes it');
        }
        return;
      }
      if (input === 's') return setSweepLine(SWEEP_PRESETS[(SWEEP_PRESETS.indexOf(sweepLine) + 1) % SWEEP_PRESETS.length]!);
      if (input === 'f') return setFormat((f) => (f + 1) % SWEEP_EXPORT_FORMATS.length);
      if (input === 'w' || input === 'W') return write(input === 'W');
      if (input === 'o') return openModule(0);
      if (input === 'g') return sendToSearch();
      const page = Math.max(1, props.height - 4);
      if (key.upArrow) setSel((s) => Math.max(0, s - 1));
      if (key.downArrow) setSel((s) => Math.min(Math.max(0, rows.length - 1), s + 1));
      if (key.pageUp) setSel((s) => Math.max(0, s - page));
      if (key.pageDown) setSel((s) => Math.min(Math.max(0, rows.length - 1), s + page));
    },
    props.active && field === undefined,
  );

  const st = job.state;
  const w = props.width;
  const top: SLine[] = field === 'sweep' ? [] : wrapLine([{ text: 'sweep ', style: 'dim' }, { text: sweepLine }], w, 6);
  const status: SLine[] = [];
  if (st.status === 'running') {
    const p = st.progress;
    status.push(...progressLines({ label: `sweep ${p?.label ?? 'planning'}`, done: p?.done ?? 0, total: p?.total, elapsedMs: now - st.startedAt, estimateSeconds: p?.estimateSeconds, sinceEstimateMs: p?.estimatedAt !== undefined ? now - p.estimatedAt : undefined }, w));
  } else if (st.status === 'error') status.push(...wrapLine(line(`✗ ${st.error}`, 'error'), w, 2));
  else if (st.status === 'cancelled') status.push(...wrapLine(line('Cancelled: the modules finished so far are kept in the catalogue; Enter resumes the sweep.', 'warn'), w, 2));
  else if (outcome) status.push(...wrapLine(line(`sweep:${outcome.doc.id} ${countsText(outcome.doc)}`, 'ok'), w, 2));
  else status.push(...wrapLine(line('Enter runs this sweep; e edits it (the options of `gradus sweep run`); s shows another example.', 'dim'), w, 2));

  const body: SLine[] = [];
  let focus: [number, number] | undefined;
  if (open && outcome && rows[open.row]) {
    const r = rows[open.row]!;
    const p = r.places[open.place]!;
    const view = moduleOutcome(outcome.modules[p.key] ?? {});
    body.push(...wrapLine(line(`${r.rank}. ${r.seed} [${r.ops.join(',')}] at n = ${p.n}${p.k !== undefined ? `, k = ${p.k}` : ''} (${open.place + 1} of ${r.places.length}): dimension ${view.dimension}`, 'accent'), w, 2));
    body.push(...wrapLine(line(`gradus ${p.key}`, 'dim'), w, 2));
    body.push(...gridLines({ table: tableOf(view), rowLabel: view.axes[1] ?? '', colLabel: view.axes[0] ?? 'x', width: w }).lines);
    for (const f of view.findings) {
      const mark = f.holds === true ? '✓ holds ' : f.holds === false ? '✗ fails ' : '· n/a   ';
      body.push(...wrapLine([{ text: mark, style: f.holds === true ? 'ok' : f.holds === false ? 'warn' : 'dim' }, { text: f.label }, ...(f.detail ? [{ text: ` — ${f.detail}`, style: 'dim' as const }] : [])], w, 8));
    }
  } else if (rows.length > 0) {
    body.push(...wrapLine(line(`rank · seed · operators · places · findings   (export: ${SWEEP_EXPORT_FORMATS[format]}, f changes it, w writes)`, 'dim'), w, 2));
    rows.forEach((r, i) => {
      const selected = i === Math.min(sel, rows.length - 1);
      const at = body.length;
      body.push(...wrapLine([{ text: `${selected ? '▶' : ' '}${String(r.rank).padStart(3)}. ${r.seed} [${r.ops.join(',')}] ${rowPlacesText(r)} — ${rowKindsText(r)}`, ...(selected ? { style: 'selected' as const } : {}) }], w, 6));
      if (!selected) return;
      for (const f of r.findings) body.push(...wrapLine([{ text: '      · ', style: 'value' }, { text: f.claim }, { text: ` — ${f.verified}`, style: 'dim' }], w, 8));
      body.push(...wrapLine(line(`      o opens its module${r.places.length > 1 ? 's (←/→)' : ''}; g searches its Hilbert series; reproduce: ${r.reproduce[r.reproduce.length - 1]}`, 'dim'), w, 8));
      focus = [at, body.length - 1];
    });
  }
  const room = Math.max(3, props.height - top.length - (field === 'sweep' ? 1 : 0) - status.length);
  const win = scroll.view(body, room, focus);
  return (
    <Box flexDirection="column" width={w}>
      <Lines lines={top} />
      {field === 'sweep' ? (
        <LineInput
          label="sweep"
          initial={sweepLine}
          active
          width={w}
          onSubmit={(v) => {
            setSweepLine(v);
            setField(undefined);
            start(v);
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      <Lines lines={[...status, ...win.lines]} />
    </Box>
  );
}
