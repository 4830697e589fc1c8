/**
 * Statistics: for a family and size, the distribution of one statistic as a bar chart, or
 * the joint distribution of two as a shaded table; flags, definitions and sources.
 */
import { Box, Text } from 'ink';
import { useEffect, useMemo, useState } from 'react';
import type { Poly } from '../../core/poly.js';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';
import { qtSeries } from '../../series/series.js';
import { isPalindromic, isUnimodal } from '../../series/seriesOps.js';
import { makeTarget, type Target } from '../../series/target.js';
import { BarChart } from '../components/BarChart.js';
import { LineInput } from '../components/LineInput.js';
import { ShadedGrid } from '../components/ShadedGrid.js';
import { Unavailable } from '../components/Unavailable.js';
import { defaultParams, loadCatalog, statisticsOf } from '../engines/catalog.js';
import { DISTRIBUTION_ENGINE_AVAILABLE, startDistribution, type DistView } from '../engines/distribution.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { distTemplate, startTemplateTarget } from '../engines/templateTarget.js';
import { ProgressBar } from '../components/ProgressBar.js';
import { useTicker, useKeys } from '../hooks.js';
import { useJob } from '../useJob.js';
import { bumpSize, paramsToText, parseParamsText } from '../engines/paramsText.js';
import { errorText } from '../errorText.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';

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
  const theme = useTheme();
  const [fi, setFi] = useState(() => Math.max(0, props.families.findIndex((f) => f.id === 'permutations')));
  const family = props.families[fi]!;
  const stats = props.statsOf(family.id);
  const [paramsBy, setParamsBy] = useState<Record<string, Params>>({});
  const params = paramsBy[family.id] ?? defaultParams(family);
  const [aBy, setABy] = useState<Record<string, number>>({});
  const [bBy, setBBy] = useState<Record<string, number>>({});
  const a = Math.min(aBy[family.id] ?? 0, stats.length - 1);
  const b = bBy[family.id] ?? -1; // -1: no second statistic
  const s1 = stats[a]!;
  const s2 = b >= 0 ? stats[b] : undefined;
  const [field, setField] = useEditField<'params'>(props.active, props.setEditing);
  const [draft, setDraft] = useState('');
  const [offset, setOffset] = useState(0);

  const job = useJob<DistView>();
  const range = useJob<Target>();
  useEffect(() => {
    if (range.state.status === 'error') props.notify(range.state.error ?? 'the range could not be computed', 'error');
    // the notice follows the range job's state
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [range.state.status]);
  const now = useTicker(job.state.status === 'running');
  const runKey = `${family.id} ${paramsToText(params)} ${s1.id} ${s2?.id ?? ''}`;
  // The key of the run whose result is shown: a result never shows under other choices.
  const [doneKey, setDoneKey] = useState('');
  useEffect(() => {
    let count: bigint;
    try {
      family.validate(params);
      count = family.count(params);
    } catch (e) {
      job.run(() => {
        throw e;
      });
      return;
    }
    setDoneKey('');
    job.run(
      (onProgress) => startDistribution({ family: family.id, params, statistics: s2 ? [s1.id, s2.id] : [s1.id] }, count, onProgress),
      () => setDoneKey(runKey),
    );
    // runKey names everything the run depends on.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [runKey]);
  const result: { poly?: Poly; error?: string } = job.state.status === 'done' && doneKey === runKey ? { poly: job.state.result!.series } : job.state.status === 'error' ? { error: job.state.error! } : {};

  const setParams = (p: Params) => {
    setParamsBy({ ...paramsBy, [family.id]: p });
    setOffset(0);
  };

  useKeys(
    (input, key) => {
      if (key.leftArrow || key.rightArrow) {
        setFi((fi + (key.leftArrow ? props.families.length - 1 : 1)) % props.families.length);
        setOffset(0);
      } else if (key.upArrow) setABy({ ...aBy, [family.id]: (a + stats.length - 1) % stats.length });
      else if (key.downArrow) setABy({ ...aBy, [family.id]: (a + 1) % stats.length });
      else if (input === 'j') {
        // Next statistic other than the first one; past the last, back to none.
        let nb = b + 1;
        if (nb === a) nb++;
        setBBy({ ...bBy, [family.id]: nb >= stats.length ? -1 : nb });
      }
      else if (input === '+' || input === '=' || input === '-') {
        try {
          const p = bumpSize(params, family.params, input === '-' ? -1 : 1);
          family.validate(p);
          setParams(p);
        } catch (e) {
          props.notify(errorText(e), 'error');
        }
      } else if (input === 'p') {
        setDraft(paramsToText(params));
        setField('params');
      } else if (input === 'g') {
        if (!result.poly) return props.notify('no distribution to search', 'error');
        const title = `${s2 ? `${s1.id} × ${s2.id}` : s1.id} on ${family.id} ${paramsToText(params)}`;
        const n = typeof params['n'] === 'number' ? params['n'] : 0;
        const k = typeof params['k'] === 'number' ? params['k'] : undefined;
        if (n === 0) {
          props.addItem({ title, origin: 'statistics', target: makeTarget(title, [{ n, ...(k !== undefined ? { k } : {}), series: qtSeries(result.poly) }]) });
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
      } else if (input === 'x') {
        job.cancel();
        range.cancel();
      }
      else if (input === ']') setOffset((o) => o + 1);
      else if (input === '[') setOffset((o) => Math.max(0, o - 1));
    },
    props.active && field === undefined,
  );

  const submit = (text: string) => {
    try {
      const p = parseParamsText(text, family.params);
      family.validate(p);
      setParams(p);
      setField(undefined);
    } catch (e) {
      props.notify(errorText(e), 'error');
    }
  };

  const infoLines = [s1, ...(s2 ? [s2] : [])].map((s) => `${s.id}: ${s.description} — ${s.source}`);
  const chartH = Math.max(3, props.height - 4 - infoLines.length);
  const poly = result.poly;
  return (
    <Box flexDirection="column">
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>family </Text>
        <Text {...theme.style('title')}>◀ {family.id} ▶</Text> {paramsToText(params)}
        <Text {...theme.style('dim')}> ({String(safeCount(family, params))} objects)</Text>
      </Text>
      {field === 'params' ? (
        <LineInput label="parameters" value={draft} active width={props.width} onChange={setDraft} onSubmit={submit} onLeave={() => setField(undefined)} />
      ) : (
        <Text wrap="truncate">
          <Text {...theme.style('dim')}>statistic </Text>
          <Text {...theme.style('accent')}>{s1.id}</Text>
          <Text {...theme.style('dim')}> ({a + 1}/{stats.length}) </Text>
          {s2 ? (
            <Text>
              <Text {...theme.style('dim')}>× </Text>
              <Text {...theme.style('accent')}>{s2.id}</Text>
              <Text {...theme.style('dim')}> (q marks {s1.id}, t marks {s2.id})</Text>
            </Text>
          ) : (
            <Text {...theme.style('dim')}>(j adds a second statistic)</Text>
          )}
        </Text>
      )}
      {infoLines.map((l, i) => (
        <Text key={i} wrap="truncate" {...theme.style('dim')}>
          {l}
        </Text>
      ))}
      {!DISTRIBUTION_ENGINE_AVAILABLE ? (
        <Text wrap="wrap" {...theme.style('warn')}>
          The distribution engine (src/enumerate) is not available in this build; no distribution is shown.
        </Text>
      ) : job.state.status === 'running' ? (
        <ProgressBar state={{ label: 'objects', done: job.state.progress?.done ?? 0, total: job.state.progress?.total, elapsedMs: now - job.state.startedAt }} width={props.width} />
      ) : job.state.status === 'cancelled' ? (
        <Text {...theme.style('warn')}>Cancelled. Change the statistic, family or size to compute again.</Text>
      ) : result.error ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {result.error}
        </Text>
      ) : poly ? (
        <>
          <Text wrap="truncate" {...theme.style('ok')}>
            {flagText(poly, s2 !== undefined)}
          </Text>
          {s2 ? (
            <ShadedGrid table={poly.toQTTable().length ? transpose(poly.toQTTable()) : [[0n]]} rowLabel="t" colLabel="q" width={props.width} height={chartH} />
          ) : (
            <BarChart bars={poly.toQArray().map((c, i) => ({ label: `q^${i}`, value: c }))} width={props.width} height={chartH} offset={offset} />
          )}
        </>
      ) : null}
    </Box>
  );
}

function transpose(t: bigint[][]): bigint[][] {
  const cols = t[0]?.length ?? 0;
  return Array.from({ length: cols }, (_, j) => t.map((r) => r[j] ?? 0n));
}

function safeCount(f: Family<unknown>, p: Params): string {
  try {
    return f.count(p).toString();
  } catch {
    return '?';
  }
}
