/**
 * The demo session, step by step: our own seed's module, one of its series as a target,
 * the search, and an export. Each step runs the engines live (in a worker, with progress
 * and cancel) and hands its result to the other screens.
 */
import { Box, Text } from 'ink';
import { useRef, useState } from 'react';
import { ProgressBar } from '../components/ProgressBar.js';
import { ShadedGrid } from '../components/ShadedGrid.js';
import { stepReport } from '../demo/demoReport.js';
import { DEMO_STEPS, type DemoState } from '../demo/demoSession.js';
import { DEMO_SHOWN_N } from '../demo/demoSeed.js';
import { tableOf } from '../engines/moduleTypes.js';
import { JobCancelled, type Job, type JobProgress } from '../engines/workerJob.js';
import { useTicker, useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { jobErrorText } from '../useJob.js';

interface Run {
  readonly step: number;
  readonly startedAt: number;
  readonly progress: JobProgress | undefined;
}

export function TourScreen(props: ScreenProps) {
  const theme = useTheme();
  const [state, setState] = useState<DemoState>({});
  const [done, setDone] = useState(0); // steps finished
  const [view, setView] = useState(0); // step whose report is shown
  const [run, setRun] = useState<Run | undefined>(undefined);
  const [error, setError] = useState<string | undefined>(undefined);
  const current = useRef<Job<unknown> | undefined>(undefined);
  const generation = useRef(0);
  const now = useTicker(run !== undefined);

  const publish = (step: number, s: DemoState) => {
    const shown = s.modules?.find((m) => m.n === DEMO_SHOWN_N);
    if (step === 0 && shown) props.addItem({ title: `module ${shown.title}`, origin: 'module', payload: shown });
    if (step === 1 && s.target) props.addItem({ title: s.target.label, origin: 'module', target: s.target });
    if (step === 2 && s.search) props.addItem({ title: `search: ${s.search.targetLabel}`, origin: 'search', payload: s.search });
  };

  const next = () => {
    if (run || done >= DEMO_STEPS.length) return;
    const step = done;
    const gen = generation.current;
    setError(undefined);
    setRun({ step, startedAt: Date.now(), progress: undefined });
    const runJob = <T,>(job: Job<T>): Promise<T> => {
      current.current = job as Job<unknown>;
      return job.result;
    };
    const onProgress = (p: JobProgress) => setRun((r) => (r ? { ...r, progress: p } : r));
    DEMO_STEPS[step]!.run(state, { env: props.env, cwd: props.cwd }, runJob, onProgress).then(
      (s) => {
        if (gen !== generation.current) return;
        current.current = undefined;
        setRun(undefined);
        setState(s);
        setDone(step + 1);
        setView(step);
        publish(step, s);
        props.notify(step + 1 < DEMO_STEPS.length ? `step ${step + 1} done; Enter runs the next one` : 'demo done: every screen now holds its results (Tab to look)');
      },
      (e: unknown) => {
        if (gen !== generation.current) return;
        current.current = undefined;
        setRun(undefined);
        if (e instanceof JobCancelled) props.notify('step cancelled; Enter runs it again');
        else setError(jobErrorText(e));
      },
    );
  };

  const restart = () => {
    generation.current++;
    current.current?.cancel();
    current.current = undefined;
    setRun(undefined);
    setState({});
    setDone(0);
    setView(0);
    setError(undefined);
  };

  useKeys(
    (input, key) => {
      if (key.return) return next();
      if (input === 'x' && run) return current.current?.cancel();
      if (input === 'r') return restart();
      if (key.leftArrow) setView((v) => Math.max(0, v - 1));
      if (key.rightArrow) setView((v) => Math.min(Math.max(0, done - 1), v + 1));
    },
    props.active,
  );

  const w = props.width;
  const shown = state.modules?.find((m) => m.n === DEMO_SHOWN_N);
  // A tall terminal shows every finished step at once; a small one the step being viewed.
  const all = props.height >= 36 && done > 1;
  const report = all
    ? Array.from({ length: done }, (_, i) => [{ text: `— step ${i + 1}`, tone: 'dim' as const }, ...stepReport(i, state, false)]).flat()
    : done > 0
      ? stepReport(view, state, false)
      : [];
  const gridRows = (all || view === 0) && shown ? tableOf(shown).length + 1 : 0;
  const room = Math.max(2, props.height - DEMO_STEPS.length - 3 - gridRows);
  return (
    <Box flexDirection="column">
      {DEMO_STEPS.map((s, i) => {
        const mark = i < done ? '✓' : run?.step === i ? '…' : i === done ? '▶' : ' ';
        return (
          <Text key={i} wrap="truncate" {...theme.style(i < done ? 'ok' : i === done ? 'title' : 'dim')}>
            {mark} {i + 1}. {s.title}
          </Text>
        );
      })}
      {run ? (
        <ProgressBar state={{ label: run.progress?.label ?? 'starting', done: run.progress?.done ?? 0, total: run.progress?.total, elapsedMs: now - run.startedAt }} width={w} />
      ) : error ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {error}
        </Text>
      ) : (
        <Text wrap="truncate" {...theme.style('dim')}>
          {done === 0
            ? 'Enter runs step 1. Each step computes live; x cancels a running step.'
            : done < DEMO_STEPS.length
              ? `Showing step ${view + 1} (←/→ other steps). Enter runs step ${done + 1}.`
              : `Showing step ${view + 1} (←/→ other steps). Done: r starts over; Tab visits the screens.`}
        </Text>
      )}
      {(all || view === 0) && shown ? (
        <ShadedGrid table={tableOf(shown)} rowLabel={shown.axes[1] ?? ''} colLabel={shown.axes[0] ?? 'x'} width={w} height={gridRows} />
      ) : null}
      <Box flexDirection="column" height={room} overflow="hidden">
        {report.map((l, i) => (
          <Text key={i} wrap="wrap" {...(l.tone ? theme.style(l.tone) : {})}>
            {l.text}
          </Text>
        ))}
      </Box>
    </Box>
  );
}
