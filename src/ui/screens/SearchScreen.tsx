/**
 * Search: take the current series (from a module, an expression, a distribution, or typed
 * coefficients), run the search in a worker, and browse the candidates with their verified
 * range and formula. A search's answer is kept with the series it was for: choosing another
 * series never shows the old candidates under it.
 */
import { Box } from 'ink';
import { useMemo, useState } from 'react';
import { parseCoeffs } from '../../series/parseCoeffs.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { progressLines } from '../components/ProgressBar.js';
import { catalogueState, SEARCH_ENGINE_AVAILABLE, startCatalogueBuild, startSearch, type BuildSummary } from '../engines/search.js';
import type { SearchOutcome } from '../engines/searchTypes.js';
import { targetLines } from '../engines/seriesText.js';
import { errorText } from '../errorText.js';
import { useKeys, useTicker } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { currentItem } from '../session.js';
import { plural } from '../text/plural.js';
import { line, wrapLine, wrapLines, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { useScroll } from '../useScroll.js';

export function SearchScreen(props: ScreenProps) {
  const [field, setField] = useEditField<'coeffs'>(props.active, props.setEditing);
  const [typed, setTyped] = useState('n=3:1,2,2,1');
  const job = useJob<SearchOutcome>('search');
  const build = useJob<BuildSummary>('catalogue');
  const catPath = cataloguePath(undefined, props.env, props.cwd);
  const [catVersion, setCatVersion] = useState(0);
  const cat = useMemo(() => catalogueState(catPath), [catPath, catVersion, props.active]);
  // Answers by the id of the series they were for; the candidate selected in each.
  const [answers, setAnswers] = useState<Record<number, SearchOutcome>>({});
  const [searchingFor, setSearchingFor] = useState<number | undefined>(undefined);
  const [selBy, setSelBy] = useState<Record<number, number>>({});
  const scroll = useScroll();
  const now = useTicker(job.state.status === 'running' || build.state.status === 'running');
  const withTarget = props.session.items.filter((x) => x.target);
  const item = currentItem(props.session);
  const target = item?.target;
  const outcome = item ? answers[item.id] : undefined;
  const cands = outcome?.candidates ?? [];
  const sel = item ? Math.min(selBy[item.id] ?? 0, Math.max(0, cands.length - 1)) : 0;
  const busyHere = job.state.status === 'running' && searchingFor === item?.id;

  const run = () => {
    if (!item || !target) return props.notify('no series to search yet: compute a module (4), evaluate an expression (5), or type coefficients (e)', 'error');
    if (build.state.status === 'running') return props.notify('the catalogue is being built; search when it is done', 'error');
    const id = item.id;
    setSearchingFor(id);
    scroll.reset();
    job.run(
      (onProgress) => startSearch(target, catPath, onProgress),
      (r) => {
        setAnswers((a) => ({ ...a, [id]: r }));
        setSelBy((s) => ({ ...s, [id]: 0 }));
        setCatVersion((v) => v + 1);
        props.addItem({ title: `search: ${item.title}`, origin: 'search', payload: r });
        props.notify(r.candidates.length ? `${plural(r.candidates.length, 'candidate')} in ${(r.elapsedMs / 1000).toFixed(2)}s` : 'no match; what was tried is listed');
      },
    );
  };

  const buildCatalogue = () => {
    if (job.state.status === 'running') return props.notify('a search is running; build when it is done', 'error');
    if (cat.maxN !== undefined && cat.maxN >= cat.buildTo && !cat.unfinished) return props.notify(`the catalogue already holds n ≤ ${cat.maxN}; the app builds up to n = ${cat.buildTo}`);
    build.run(
      (onProgress) => startCatalogueBuild(catPath, cat.buildTo, onProgress),
      (r) => {
        setCatVersion((v) => v + 1);
        props.notify(r.text);
      },
    );
  };

  useKeys(
    (input, key) => {
      if (key.return) return run();
      if (input === 'e') return setField('coeffs');
      if (input === 'x') {
        if (job.state.status !== 'running' && build.state.status !== 'running') return props.notify('nothing is running');
        job.cancel();
        build.cancel();
        return props.notify('cancelled');
      }
      if (input === 'b') return buildCatalogue();
      if (input === '[' || input === ']') {
        if (withTarget.length === 0) return props.notify('no series yet: compute a module (4), evaluate an expression (5), or type coefficients (e)', 'error');
        const at = withTarget.findIndex((x) => x.id === item?.id);
        const next = withTarget[(at + (input === ']' ? 1 : withTarget.length - 1) + withTarget.length) % withTarget.length]!;
        scroll.reset();
        return props.setCurrent(next.id);
      }
      if ((key.downArrow || key.upArrow) && item) {
        const n = cands.length;
        if (n === 0) return;
        return setSelBy((s) => ({ ...s, [item.id]: Math.max(0, Math.min(n - 1, sel + (key.downArrow ? 1 : -1))) }));
      }
      scroll.handle(input, key, false);
    },
    props.active && field === undefined,
  );

  const submitCoeffs = (text: string) => {
    try {
      const t = parseCoeffs(text);
      props.addItem({ title: `typed ${text}`, origin: 'typed', target: t });
      setTyped(text);
      setField(undefined);
      props.notify('the typed series is now the current one; Enter searches it');
    } catch (e) {
      props.notify(errorText(e, 'search'), 'error');
    }
  };

  const w = props.width;
  const st = job.state;
  const top: SLine[] = [];
  if (item && target) top.push(...wrapLine([{ text: `target ${withTarget.length > 1 ? `(${withTarget.findIndex((x) => x.id === item.id) + 1} of ${withTarget.length}, [/] others) ` : ''}`, style: 'dim' }, { text: item.title, style: 'title' }], w, 7));
  else top.push(...wrapLine([{ text: 'target ', style: 'dim' }, { text: 'none yet — compute a module (4), evaluate an expression (5), or type coefficients (e)', style: 'warn' }], w, 7));
  const fieldHint = field === 'coeffs' ? wrapLine(line('entries n=N:c0,c1,… (coefficients of q^0, q^1, …) separated by ; — q,t rows split by |; Esc keeps the series as it was', 'dim'), w, 2) : [];

  const body: SLine[] = [];
  if (target) body.push(...wrapLines(targetLines(target, target.entries.length).map((l) => line(`  ${l}`)), w, 6));
  const catText =
    cat.error !== undefined
      ? `catalogue ${catPath}: ${cat.error}`
      : cat.maxN === undefined
        ? `catalogue ${catPath}: none yet (b builds it up to n = ${cat.buildTo}, a minute or two)`
        : `catalogue ${catPath}: n ≤ ${cat.maxN}${cat.unfinished ? ', build unfinished (b resumes it)' : cat.maxN < cat.buildTo ? ` (b builds it up to n = ${cat.buildTo})` : ''}`;
  body.push(...wrapLine(line(catText, cat.error !== undefined ? 'error' : 'dim'), w, 2));
  const bs = build.state;
  if (bs.status === 'running') body.push(...progressLines({ label: bs.progress?.label ?? 'catalogue build', done: bs.progress?.done ?? 0, total: bs.progress?.total, elapsedMs: now - bs.startedAt }, w));
  else if (bs.status === 'error') body.push(...wrapLine(line(`✗ ${bs.error}`, 'error'), w, 2));
  else if (bs.status === 'cancelled') body.push(line('Catalogue build cancelled; b resumes it.', 'warn'));
  if (!SEARCH_ENGINE_AVAILABLE) body.push(...wrapLine(line('The search engine (src/match) is not available in this build; nothing can be searched here.', 'warn'), w));
  else if (busyHere) body.push(...progressLines({ label: st.progress?.label ?? 'searching', done: st.progress?.done ?? 0, total: st.progress?.total, elapsedMs: now - st.startedAt }, w));
  else if (st.status === 'error' && searchingFor === item?.id) body.push(...wrapLine(line(`✗ ${st.error}`, 'error'), w, 2));
  else if (st.status === 'cancelled' && searchingFor === item?.id) body.push(line('Search cancelled. Enter runs it again.', 'warn'));
  else if (outcome) {
    body.push(...wrapLine(line(cands.length ? `${plural(cands.length, 'candidate')}, simplest first.` : 'No statistic matched.', cands.length ? 'ok' : 'warn'), w, 2));
    body.push(...wrapLine(line(`Tried: ${outcome.tried}`, 'dim'), w, 2));
  } else if (target) body.push(line('Enter searches the catalogue for this series.', 'dim'));
  if (outcome) for (const r of outcome.recognition) body.push(...wrapLine(line(r, 'accent'), w, 2));
  let focus: [number, number] | undefined;
  cands.forEach((c, i) => {
    const isSel = i === sel;
    const start = body.length;
    body.push(...wrapLine([{ text: isSel ? '▶ ' : '  ' }, { text: `${i + 1}. ${c.title}`, ...(isSel ? { style: 'selected' as const } : {}) }, { text: ` (${c.range})`, style: 'dim' }], w, 5));
    if (isSel) {
      body.push(...wrapLine(line(`     verified ${c.range}${c.formula ? `   formula ${c.formula}` : ''}`, 'value'), w, 7));
      for (const d of c.detail) body.push(...wrapLine(line(`     ${d}`, 'dim'), w, 7));
      focus = [start, body.length - 1];
    }
  });
  const room = Math.max(3, props.height - top.length - (field === 'coeffs' ? 1 : 0) - fieldHint.length);
  const win = scroll.view(body, room, focus);
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'coeffs' ? <LineInput label="series" initial={typed} active width={w} onSubmit={submitCoeffs} onCancel={() => setField(undefined)} /> : null}
      <Lines lines={[...fieldHint, ...win.lines]} />
    </Box>
  );
}
