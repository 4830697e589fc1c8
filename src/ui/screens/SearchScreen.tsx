/**
 * Search: take the current series (from a module, an expression, a distribution, or typed
 * coefficients), run the search in a worker, and browse the candidates with their
 * verified range and formula.
 */
import { Box, Text } from 'ink';
import { useState } from 'react';
import { parseCoeffs } from '../../series/parseCoeffs.js';
import { LineInput } from '../components/LineInput.js';
import { ProgressBar } from '../components/ProgressBar.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { APP_CATALOGUE_N_MAX, SEARCH_ENGINE_AVAILABLE, startCatalogueBuild, startSearch, type BuildSummary } from '../engines/search.js';
import type { SearchOutcome } from '../engines/searchTypes.js';
import { targetLines } from '../engines/seriesText.js';
import { errorText } from '../errorText.js';
import { useTicker, useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { currentItem } from '../session.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';

export function SearchScreen(props: ScreenProps) {
  const theme = useTheme();
  const [field, setField] = useEditField<'coeffs'>(props.active, props.setEditing);
  const [draft, setDraft] = useState('n=3:1,2,2,1');
  const job = useJob<SearchOutcome>();
  const build = useJob<BuildSummary>();
  const catPath = cataloguePath(undefined, props.env, props.cwd);
  const [sel, setSel] = useState(0);
  const now = useTicker(job.state.status === 'running' || build.state.status === 'running');
  const withTarget = props.session.items.filter((x) => x.target);
  const item = currentItem(props.session);
  const target = item?.target;
  const outcome = job.state.result;

  const run = () => {
    if (!target) return props.notify('no series to search: compute a module, evaluate an expression, or type coefficients (e)', 'error');
    setSel(0);
    job.run(
      (onProgress) => startSearch(target, catPath, onProgress),
      (r) => {
        props.addItem({ title: `search: ${item?.title ?? target.label}`, origin: 'search', payload: r });
        props.notify(r.candidates.length ? `${r.candidates.length} candidate(s) in ${(r.elapsedMs / 1000).toFixed(2)}s` : `no match; tried ${r.tried}`);
      },
    );
  };

  useKeys(
    (input, key) => {
      if (key.return) return run();
      if (input === 'e') return setField('coeffs');
      if (input === 'x' && (job.state.status === 'running' || build.state.status === 'running')) {
        job.cancel();
        build.cancel();
        return props.notify('cancelled');
      }
      if (input === 'b') {
        return build.run(
          (onProgress) => startCatalogueBuild(catPath, APP_CATALOGUE_N_MAX, onProgress),
          (r) => props.notify(r.text),
        );
      }
      if (input === '[' || input === ']') {
        if (withTarget.length === 0) return;
        const at = withTarget.findIndex((x) => x.id === item?.id);
        const next = withTarget[(at + (input === ']' ? 1 : withTarget.length - 1) + withTarget.length) % withTarget.length]!;
        return props.setCurrent(next.id);
      }
      const n = outcome?.candidates.length ?? 0;
      if (key.downArrow) setSel((s) => Math.min(Math.max(0, n - 1), s + 1));
      if (key.upArrow) setSel((s) => Math.max(0, s - 1));
    },
    props.active && field === undefined,
  );

  const submitCoeffs = (text: string) => {
    try {
      const t = parseCoeffs(text);
      props.addItem({ title: `typed ${text}`, origin: 'typed', target: t });
      setField(undefined);
      props.notify('typed series is now the current one; Enter searches');
    } catch (e) {
      props.notify(errorText(e), 'error');
    }
  };

  const st = job.state;
  const w = props.width;
  const previewN = props.height >= 20 ? 3 : 2;
  const cands = outcome?.candidates ?? [];
  const detail = cands[sel];
  const detailLines = detail ? [`verified ${detail.range}${detail.formula ? `   formula ${detail.formula}` : ''}`, ...detail.detail].slice(0, 4) : [];
  const listH = Math.max(2, props.height - 7 - (outcome ? 2 : 0) - previewN - (outcome?.recognition.length ?? 0) - detailLines.length);
  const start = Math.max(0, Math.min(sel - listH + 1, cands.length - listH));
  return (
    <Box flexDirection="column">
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>target {withTarget.length > 1 ? '[/] ' : ''}</Text>
        {item && target ? <Text {...theme.style('title')}>{item.title}</Text> : <Text {...theme.style('warn')}>none yet — compute a module (4), evaluate an expression (5), or type coefficients (e)</Text>}
      </Text>
      {field === 'coeffs' ? (
        <>
          <LineInput label="series" value={draft} active width={w} onChange={setDraft} onSubmit={submitCoeffs} onLeave={() => setField(undefined)} />
          <Text wrap="truncate" {...theme.style('dim')}>
            entries n=N:c0,c1,… (coefficients of q^0, q^1, …) separated by ; — q,t rows split by |
          </Text>
        </>
      ) : null}
      {target
        ? targetLines(target, previewN).map((l, i) => (
            <Text key={i} wrap="truncate">
              {'  '}
              {l}
            </Text>
          ))
        : null}
      <Text wrap="truncate" {...theme.style('dim')}>
        catalogue {catPath} (b builds it up to n = {APP_CATALOGUE_N_MAX})
      </Text>
      {build.state.status === 'running' ? (
        <ProgressBar state={{ label: build.state.progress?.label ?? 'catalogue build', done: build.state.progress?.done ?? 0, total: build.state.progress?.total, elapsedMs: now - build.state.startedAt }} width={w} />
      ) : build.state.status === 'error' ? (
        <Text wrap="truncate" {...theme.style('error')}>
          ✗ {build.state.error}
        </Text>
      ) : build.state.result ? (
        <Text wrap="truncate" {...theme.style('ok')}>
          {build.state.result.text}
        </Text>
      ) : null}
      {!SEARCH_ENGINE_AVAILABLE ? (
        <Text wrap="wrap" {...theme.style('warn')}>
          The search engine (src/match) is not available in this build; nothing can be searched here.
        </Text>
      ) : st.status === 'running' ? (
        <ProgressBar state={{ label: st.progress?.label ?? 'searching', done: st.progress?.done ?? 0, total: st.progress?.total, elapsedMs: now - st.startedAt }} width={w} />
      ) : st.status === 'error' ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {st.error}
        </Text>
      ) : st.status === 'cancelled' ? (
        <Text {...theme.style('warn')}>Search cancelled. Enter runs it again.</Text>
      ) : outcome ? (
        <Text wrap="wrap" {...theme.style(cands.length ? 'ok' : 'warn')}>
          {cands.length ? `${cands.length} candidate(s), simplest first` : 'No statistic matched.'} Tried: {outcome.tried}
        </Text>
      ) : (
        <Text {...theme.style('dim')}>Enter searches the catalogue for this series.</Text>
      )}
      {outcome?.recognition.map((r, i) => (
        <Text key={`r${i}`} wrap="truncate" {...theme.style('accent')}>
          {r}
        </Text>
      ))}
      {cands.slice(start, start + listH).map((c, i) => {
        const at = start + i;
        return (
          <Text key={at} wrap="truncate" {...(at === sel ? theme.style('selected') : {})}>
            {at === sel ? '▶ ' : '  '}
            {at + 1}. {c.title} <Text {...(at === sel ? {} : theme.style('dim'))}>({c.range})</Text>
          </Text>
        );
      })}
      {detailLines.map((l, i) => (
        <Text key={`d${i}`} wrap="truncate" {...theme.style(i === 0 ? 'value' : 'dim')}>
          {l}
        </Text>
      ))}
    </Box>
  );
}
