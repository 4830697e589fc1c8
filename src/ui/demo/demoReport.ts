/** What each demo step found, as lines of text (the Tour screen and the text demo share them). */
import { entryKey } from '../../series/target.js';
import { seriesText } from '../engines/seriesText.js';
import { plural } from '../text/plural.js';
import { tableOf } from '../engines/moduleTypes.js';
import type { DemoState } from './demoSession.js';
import { DEMO_SHOWN_N, demoSeedText } from './demoSeed.js';

export type ReportLine = { readonly text: string; readonly tone?: 'ok' | 'warn' | 'dim' | 'accent' };

export function stepReport(step: number, s: DemoState, withTable: boolean): ReportLine[] {
  const out: ReportLine[] = [];
  if (step === 0 && s.modules) {
    out.push({ text: `seed ${demoSeedText(DEMO_SHOWN_N)}: the staircase x1^2 x2 with θ on x3 (x-exponent 0), antisymmetrized — our own, not a named seed`, tone: 'dim' });
    out.push({ text: `dimensions: ${s.modules.map((m) => `n=${m.n}: ${m.dimension}`).join(', ')}  (${s.modules[0]?.exactness ?? ''})` });
    const shown = s.modules.find((m) => m.n === DEMO_SHOWN_N);
    if (shown) {
      if (withTable) {
        const t = tableOf(shown);
        t.forEach((row, i) => out.push({ text: `  ${shown.axes[1] ?? ''}-degree ${i}: ${row.map((v) => String(v).padStart(3)).join(' ')}   (x-degree 0, 1, …)` }));
      }
      for (const f of shown.findings) out.push({ text: `${f.holds === true ? '✓' : f.holds === false ? '✗' : '·'} ${f.label}: ${f.detail}`, tone: f.holds === true ? 'ok' : f.holds === false ? 'warn' : 'dim' });
    }
  }
  if (step === 1 && s.target) {
    out.push({ text: s.target.label, tone: 'dim' });
    for (const e of s.target.entries) out.push({ text: `  ${entryKey(e.n, e.k)}: ${seriesText(e.series)}` });
    const more = (s.targets ?? []).slice(1);
    if (more.length) out.push({ text: `and ${more.length} more: ${more.map((t) => t.label.split(' of ')[0]).join('; ')}`, tone: 'dim' });
  }
  if (step === 2 && s.search) {
    if (s.catalogue) out.push({ text: `catalogue: ${s.catalogue.note}`, tone: 'dim' });
    for (const x of s.searches ?? []) {
      const what = x.targetLabel.split(' of ')[0];
      out.push({ text: `${x.candidates.length ? '✓' : '·'} ${what}: ${x.candidates.length ? plural(x.candidates.length, 'candidate') : 'no match'}`, tone: x.candidates.length ? 'ok' : 'dim' });
    }
    out.push({ text: `In detail — ${s.search.targetLabel.split(' of ')[0]}:` });
    for (const r of s.search.recognition) out.push({ text: r, tone: 'accent' });
    const c = s.search.candidates;
    if (c.length === 0) {
      out.push({ text: 'no match: no distribution in the catalogue equals this series or its variants.', tone: 'warn' });
    } else {
      out.push({ text: `${plural(c.length, 'candidate')}, simplest first:`, tone: 'ok' });
      c.slice(0, 3).forEach((x, i) => out.push({ text: `  ${i + 1}. ${x.title} — verified ${x.range}` }));
    }
    out.push({ text: `tried: ${s.search.tried}`, tone: 'dim' });
  }
  if (step === 3) {
    if (s.exported) {
      out.push({ text: `wrote ${s.exported.bytes} bytes of Markdown (the matches with definitions and sources, or what was tried) to`, tone: 'ok' });
      out.push({ text: `  ${s.exported.path}`, tone: 'ok' });
      out.push({ text: 'The Export screen (7) writes any result of the session where you choose (a search in Markdown, LaTeX or JSON), and saves the session (w).', tone: 'dim' });
    }
    else if (s.exportNote) out.push({ text: s.exportNote, tone: 'warn' });
  }
  return out;
}
