/**
 * The demo session, step by step: our own seed's module, one of its series as a target,
 * the search, and an export. Each step runs the engines live (in a worker, with progress
 * and cancel) and hands its result to the other screens.
 */
import { useRef, useState } from 'react';
import { Lines } from '../components/Lines.js';
import { progressLines } from '../components/ProgressBar.js';
import { gridLines } from '../components/ShadedGrid.js';
import { stepReport } from '../demo/demoReport.js';
import { DEMO_STEPS, type DemoState } from '../demo/demoSession.js';
import { DEMO_SHOWN_N } from '../demo/demoSeed.js';
import { tableOf } from '../engines/moduleTypes.js';
import { JobCancelled, type Job, type JobProgress } from '../engines/workerJob.js';
import { useTicker, useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { jobErrorText } from '../useJob.js';
import { useScroll } from '../useScroll.js';

interface Run {
  readonly step: number;
  readonly startedAt: number;
  readonly progress: JobProgress | undefined;
}

export function TourScreen(props: ScreenProps) {
  const [state, setState] = useState<DemoState>({});
  const [done, setDone] = useState(0); // steps finished
  const [view, setView] = useState(0); // step whose report is shown
  const [run, setRun] = useState<Run | undefined>(undefined);
  const [error, setError] = useState<string | undefined>(undefined);
  const current = useRef<Job<unknown> | undefined>(undefined);
  const generation = useRef(0);
  const now = useTicker(run !== undefined);
  const scroll = useScroll();

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
        scroll.reset();
        publish(step, s);
        props.notify(step + 1 < DEMO_STEPS.length ? `step ${step + 1} done; Enter runs the next one` : 'demo done: every screen now holds its results (Tab to look)');
      },
      (e: unknown) => {
        if (gen !== generation.current) return;
        current.current = undefined;
        setRun(undefined);
        if (e instanceof JobCancelled) props.notify('step cancelled; Enter runs it again');
        else setError(jobErrorText(e, 'tour'));
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
      if (key.return) {
        if (run) return props.notify('a step is running (x cancels it)');
        if (done >= DEMO_STEPS.length) return props.notify('the demo is done: r starts over; Tab visits the screens');
        return next();
      }
      if (input === 'x') {
        if (!run) return props.notify('nothing is running');
        return current.current?.cancel();
      }
      if (input === 'r') return restart();
      if (key.leftArrow || key.rightArrow) {
        scroll.reset();
        return setView((v) => (key.leftArrow ? Math.max(0, v - 1) : Math.min(Math.max(0, done - 1), v + 1)));
      }
      scroll.handle(input, key, true);
    },
    props.active,
  );

  const w = props.width;
  const shown = state.modules?.find((m) => m.n === DEMO_SHOWN_N);
  const steps: SLine[] = DEMO_STEPS.flatMap((s, i) => {
    const mark = i < done ? '✓' : run?.step === i ? '…' : i === done ? '▶' : ' ';
    return wrapLine(line(`${mark} ${i + 1}. ${s.title}`, i < done ? 'ok' : i === done ? 'title' : 'dim'), w, 5);
  });
  const status: SLine[] = run
    ? progressLines({ label: run.progress?.label ?? 'starting', done: run.progress?.done ?? 0, total: run.progress?.total, elapsedMs: now - run.startedAt, estimateSeconds: run.progress?.estimateSeconds, sinceEstimateMs: run.progress?.estimatedAt !== undefined ? now - run.progress.estimatedAt : undefined }, w)
    : error
      ? wrapLine(line(`✗ ${error}`, 'error'), w, 2)
      : wrapLine(
          line(
            done === 0
              ? 'Enter runs step 1. Each step computes live; x cancels a running step.'
              : done < DEMO_STEPS.length
                ? `Showing step ${view + 1} (←/→ other steps). Enter runs step ${done + 1}.`
                : `Showing step ${view + 1} (←/→ other steps). Done: r starts over; Tab visits the screens.`,
            'dim',
          ),
          w,
          2,
        );
  // A tall terminal shows every finished step at once; a small one the step being viewed.
  const all = props.height >= 36 && done > 1;
  const body: SLine[] = [];
  if ((all || view === 0) && shown && done > 0) body.push(...gridLines({ table: tableOf(shown), rowLabel: shown.axes[1] ?? '', colLabel: shown.axes[0] ?? 'x', width: w }).lines);
  const report = all
    ? Array.from({ length: done }, (_, i) => [{ text: `— step ${i + 1}`, tone: 'dim' as const }, ...stepReport(i, state, false)]).flat()
    : done > 0
      ? stepReport(view, state, false)
      : [];
  for (const l of report) body.push(...wrapLine(line(l.text, l.tone), w, 2));
  const win = scroll.view(body, Math.max(3, props.height - steps.length - status.length), undefined, ['↑/PgUp', '↓/PgDn']);
  return <Lines lines={[...steps, ...status, ...win.lines]} />;
}
