/**
 * Statistics: for a family and size, the distribution of one statistic as a bar chart, or
 * the joint distribution of two as a shaded table (scrolling down and sideways, with
 * markers); flags, definitions and sources.
 */
import { Box } from 'ink';
import { useEffect, useMemo, useRef, useState } from 'react';
import type { Poly } from '../../core/poly.js';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';
import { qtSeries } from '../../series/series.js';
import { isPalindromic, isUnimodal } from '../../series/seriesOps.js';
import { makeTarget, type Target } from '../../series/target.js';
import { barLines } from '../components/BarChart.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { progressLines } from '../components/ProgressBar.js';
import { gridLines } from '../components/ShadedGrid.js';
import { Unavailable } from '../components/Unavailable.js';
import { defaultParams, loadCatalog, statisticsOf } from '../engines/catalog.js';
import { DISTRIBUTION_ENGINE_AVAILABLE, startDistribution, type DistView } from '../engines/distribution.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { distTemplate, startTemplateTarget } from '../engines/templateTarget.js';
import { bumpSize, paramsToText, parseParamsText } from '../engines/paramsText.js';
import { errorText } from '../errorText.js';
import { useKeys, useTicker } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { useScroll } from '../useScroll.js';
import { objectsText } from './objectsText.js';

export function StatisticsScreen(props: ScreenProps) {
  const catalog = useMemo(loadCatalog, []);
  if (!catalog) return <Unavailable what="The Statistics screen" engine="objects/ and statistics/ registries" />;
  const families = catalog.families.filter((f) => statisticsOf(catalog, f.id).length > 0);
  if (families.length === 0) return <Unavailable what="The Statistics screen" engine="statistics/ registry" />;
  return <StatisticsView {...props} families={families} statsOf={(id) => statisticsOf(catalog, id)} />;
}

function flagText(p: Poly, joint: boolean): string {
  if (joint) {
    const sym = p.equals(p.swapQT());
    return `${sym ? '✓' : '✗'} symmetric in q,t   ${isPalindromic(p) ? '✓' : '✗'} palindromic`;
  }
  return `${isPalindromic(p) ? '✓' : '✗'} symmetric (palindromic)   ${isUnimodal(p) ? '✓' : '✗'} unimodal`;
}

function StatisticsView(props: ScreenProps & { families: readonly Family<unknown>[]; statsOf: (id: string) => readonly Statistic<unknown>[] }) {
  const [fi, setFi] = useState(() => Math.max(0, props.families.findIndex((f) => f.id === 'permutations')));
  const family = props.families[fi]!;
  const stats = props.statsOf(family.id);
  const [paramsBy, setParamsBy] = useState<Record<string, Params>>({});
  const params = paramsBy[family.id] ?? defaultParams(family, 5000n, stats);
  const [aBy, setABy] = useState<Record<string, number>>({});
  const [bBy, setBBy] = useState<Record<string, number>>({});
  const a = Math.min(aBy[family.id] ?? 0, stats.length - 1);
  const b = bBy[family.id] ?? -1; // -1: no second statistic
  const s1 = stats[a]!;
  const s2 = b >= 0 ? stats[b] : undefined;
  const [field, setField] = useEditField<'params'>(props.active, props.setEditing);
  const [colOffset, setColOffset] = useState(0);
  const shownCol = useRef(0); // the first column drawn last time (the offset clamped)
  const scroll = useScroll();

  const job = useJob<DistView>('statistics');
  const range = useJob<Target>('statistics');
  useEffect(() => {
    if (range.state.status === 'error') props.notify(range.state.error ?? 'the range could not be computed', 'error');
    // the notice follows the range job's state
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [range.state.status]);
  const now = useTicker(job.state.status === 'running');
  const runKey = `${family.id} ${paramsToText(params)} ${s1.id} ${s2?.id ?? ''}`;
  // The key of the run whose result (or error) is shown: nothing shows under other choices.
  const [doneKey, setDoneKey] = useState('');
  useEffect(() => {
    let count: bigint;
    setDoneKey(runKey);
    try {
      family.validate(params);
      count = family.count(params);
    } catch (e) {
      job.run(() => {
        throw e;
      });
      return;
    }
    job.run((onProgress) => startDistribution({ family: family.id, params, statistics: s2 ? [s1.id, s2.id] : [s1.id] }, count, onProgress));
    // runKey names everything the run depends on.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [runKey]);
  const current = doneKey === runKey;
  const poly = current && job.state.status === 'done' ? job.state.result!.series : undefined;

  const changed = () => {
    setColOffset(0);
    scroll.reset();
  };
  const setParams = (p: Params) => {
    setParamsBy({ ...paramsBy, [family.id]: p });
    changed();
  };

  useKeys(
    (input, key) => {
      if (key.leftArrow || key.rightArrow) {
        setFi((fi + (key.leftArrow ? props.families.length - 1 : 1)) % props.families.length);
        return changed();
      }
      if (key.upArrow || key.downArrow) {
        setABy({ ...aBy, [family.id]: (a + (key.upArrow ? stats.length - 1 : 1)) % stats.length });
        return changed();
      }
      if (input === 'j') {
        // Next statistic other than the first one; past the last, back to none.
        let nb = b + 1;
        if (nb === a) nb++;
        setBBy({ ...bBy, [family.id]: nb >= stats.length ? -1 : nb });
        return changed();
      }
      if (input === '+' || input === '=' || input === '-') {
        try {
          const p = bumpSize(params, family.params, input === '-' ? -1 : 1);
          if (p === params) return props.notify(`${family.id} has no size n to change (p edits its parameters)`, 'error');
          family.validate(p);
          if (p['n'] === params['n']) return props.notify(`n is at the end of its range for ${family.id}`, 'error');
          setParams(p);
        } catch (e) {
          props.notify(errorText(e, 'statistics'), 'error');
        }
        return;
      }
      if (input === 'p') return setField('params');
      if (input === 'g') {
        if (!poly) return props.notify('no distribution to search yet', 'error');
        const title = `${s2 ? `${s1.id} × ${s2.id}` : s1.id} on ${family.id} ${paramsToText(params)}`;
        const n = typeof params['n'] === 'number' ? params['n'] : 0;
        const k = typeof params['k'] === 'number' ? params['k'] : undefined;
        if (n === 0) {
          props.addItem({ title, origin: 'statistics', target: makeTarget(title, [{ n, ...(k !== undefined ? { k } : {}), series: qtSeries(poly) }]) });
          return props.go('search');
        }
        // the whole range n = 1..N (and every k) goes to the search, as gradus search --from builds it
        const nFrom = Math.max(1, family.params.find((p) => p.name === 'n')?.min ?? 1);
        props.notify(`computing n = ${nFrom}..${n}${k !== undefined ? ', all k' : ''} for the search… (x cancels)`);
        range.run(
          (onProgress) => startTemplateTarget(distTemplate(family.id, params, s2 ? [s1.id, s2.id] : [s1.id]), nFrom, n, props.cwd, existingCatalogue(props.env, props.cwd), onProgress),
          (t) => {
            props.addItem({ title: `${title.replace(/ n=\d+/, '').replace(/ k=\d+/, '')}, n = ${nFrom}..${n}${k !== undefined ? ', all k' : ''}`, origin: 'statistics', target: t });
            props.go('search');
          },
        );
        return;
      }
      if (input === 'x') {
        if (job.state.status !== 'running' && range.state.status !== 'running') return props.notify('nothing is running');
        job.cancel();
        return range.cancel();
      }
      if (input === '<' || input === ',') return setColOffset(Math.max(0, shownCol.current - 1));
      if (input === '>' || input === '.') return setColOffset(shownCol.current + 1);
      scroll.handle(input, key, false);
    },
    props.active && field === undefined,
  );

  const submit = (text: string) => {
    try {
      const p = parseParamsText(text, family.params);
      family.validate(p);
      setParams(p);
      setField(undefined);
      props.notify(`${family.id}: ${paramsToText(p)}`);
    } catch (e) {
      props.notify(errorText(e, 'statistics'), 'error');
    }
  };

  const w = props.width;
  const top: SLine[] = wrapLine(
    [
      { text: 'family ', style: 'dim' },
      { text: `◀ ${family.id} ▶`, style: 'title' },
      { text: ` ${paramsToText(params)} ` },
      { text: `(${objectsText(family, params)})`, style: 'dim' },
    ],
    w,
    7,
  );
  if (field !== 'params') {
    top.push(
      ...wrapLine(
        [
          { text: 'statistic ', style: 'dim' },
          { text: s1.id, style: 'accent' },
          { text: ` (${a + 1}/${stats.length}) `, style: 'dim' },
          ...(s2
            ? [{ text: '× ', style: 'dim' as const }, { text: s2.id, style: 'accent' as const }, { text: ` (q marks ${s1.id}, t marks ${s2.id})`, style: 'dim' as const }]
            : [{ text: '(j adds a second statistic)', style: 'dim' as const }]),
        ],
        w,
        10,
      ),
    );
  }
  const body: SLine[] = [];
  const st = job.state;
  if (!DISTRIBUTION_ENGINE_AVAILABLE) body.push(...wrapLine(line('The distribution engine (src/enumerate) is not available in this build; no distribution is shown.', 'warn'), w));
  else if (!current || st.status === 'running') body.push(...progressLines({ label: 'objects', done: st.progress?.done ?? 0, total: st.progress?.total, elapsedMs: now - st.startedAt }, w));
  else if (st.status === 'cancelled') body.push(...wrapLine(line('Cancelled. Change the statistic, family or size to compute again.', 'warn'), w, 2));
  else if (st.status === 'error') body.push(...wrapLine(line(`✗ ${st.error}`, 'error'), w, 2));
  else if (poly) {
    body.push(line(flagText(poly, s2 !== undefined), 'ok'));
    if (s2) {
      const t = poly.toQTTable();
      const grid = gridLines({ table: t.length ? transpose(t) : [[0n]], rowLabel: 't', colLabel: 'q', width: w, colOffset, sideKeys: '</>' });
      shownCol.current = grid.colStart;
      body.push(...grid.lines);
    } else body.push(...barLines(poly.toQArray().map((c, i) => ({ label: `q^${i}`, value: c })), w));
  }
  for (const s of [s1, ...(s2 ? [s2] : [])]) body.push(...wrapLine([{ text: `${s.id}: `, style: 'accent' }, { text: `${s.description} — ${s.source}`, style: 'dim' }], w, 2));
  const room = Math.max(3, props.height - top.length - (field === 'params' ? 1 : 0));
  const win = scroll.view(body, room);
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'params' ? <LineInput label="parameters" initial={paramsToText(params)} active width={w} onSubmit={submit} onCancel={() => setField(undefined)} /> : null}
      <Lines lines={win.lines} />
    </Box>
  );
}

function transpose(t: bigint[][]): bigint[][] {
  const cols = t[0]?.length ?? 0;
  return Array.from({ length: cols }, (_, j) => t.map((r) => r[j] ?? 0n));
}
