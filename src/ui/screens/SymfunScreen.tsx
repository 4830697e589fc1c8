/**
 * Symmetric functions: type an expression of the `gradus sym` language, see the result in
 * the Schur basis one term per line (wrapped, scrolling with markers); a parse error is
 * pointed at its column under the expression.
 */
import { Box } from 'ink';
import { useState } from 'react';
import { seriesFromJson } from '../../series/seriesJson.js';
import { makeTarget, type Target } from '../../series/target.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { atSize, errorColumn, hasSize, middleK, startAddFamily, startSym, startSymTarget, SYMFUN_ENGINE_AVAILABLE, type SymOutcome } from '../engines/symfun.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { splitTerms } from '../text/splitTerms.js';
import { line, wrapLine, wrapLines, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { useScroll } from '../useScroll.js';

export const DEFAULT_EXPRESSION = 'nabla(e({n}))';
const FORMS = 'Forms: e(4) h(2,1) s(2,1) p(2,1) m(2,1) H(2,1) HL(2,1) nabla(F) delta(f,F) deltaprime(f,F) omega(F) subs(F,t=0) swap(F) pleth(F,1-q) plethdiv(F,1-q) revq(F) hall(F,G) star(F,G) hilbert(F)';

/** The expression with a caret under `col` (1-based): whole when it fits, else the part around it. */
function caretLines(expr: string, col: number, width: number): SLine[] {
  const room = width - 4;
  const chars = [...expr];
  const from = chars.length <= room ? 0 : Math.max(0, Math.min(col - 1 - Math.floor(room / 2), chars.length - room + 1));
  const shown = (from > 0 ? '…' : '') + chars.slice(from, from + room - (from > 0 ? 1 : 0)).join('');
  const at = col - 1 - from + (from > 0 ? 1 : 0);
  return [
    [{ text: 'at  ', style: 'dim' }, { text: shown }],
    [{ text: ' '.repeat(4 + Math.max(0, at)) + '^', style: 'error' }],
  ];
}

export function SymfunScreen(props: ScreenProps) {
  const [expr, setExpr] = useState(DEFAULT_EXPRESSION);
  const [field, setField] = useEditField<'expr' | 'name'>(props.active, props.setEditing);
  const job = useJob<SymOutcome>('symfun');
  const family = useJob<Target>('symfun');
  const add = useJob<{ text: string }>('symfun');
  const [size, setSize] = useState(3);
  const scroll = useScroll();

  const evaluate = (text: string) => {
    scroll.reset();
    family.clear();
    job.run(
      (onProgress) => startSym(hasSize(text) ? atSize(text, size) : text, onProgress),
      (r) => props.addItem({ title: `sym ${r.expression}`, origin: 'symfun', payload: r }),
    );
  };

  const sendToSearch = () => {
    if (hasSize(expr)) {
      props.notify(`evaluating ${expr} for n = 1..${size}${expr.includes('{k}') ? ', all k' : ''}…`);
      return family.run(
        (onProgress) => startSymTarget(expr, size, props.cwd, existingCatalogue(props.env, props.cwd), onProgress),
        (t) => {
          props.addItem({ title: `sym ${expr}, n = 1..${size}${expr.includes('{k}') ? ', all k' : ''}`, origin: 'symfun', target: t });
          props.go('search');
        },
      );
    }
    const r = job.state.result;
    if (!r) return props.notify('evaluate an expression first (Enter)', 'error');
    if (r.degree === undefined || r.seriesJson === undefined) return props.notify('only a homogeneous result with integer coefficients can be searched', 'error');
    try {
      const series = seriesFromJson(r.seriesJson, 'sym result');
      const title = `sym ${r.expression}`;
      props.addItem({ title, origin: 'symfun', target: makeTarget(title, [{ n: r.degree, series }]) });
      props.go('search');
    } catch (e) {
      props.notify(errorText(e, 'symfun'), 'error');
    }
  };

  useKeys(
    (input, key) => {
      if (key.return) return evaluate(expr);
      if (input === 'e') return setField('expr');
      if (input === 'g') return sendToSearch();
      if (input === 'a') {
        if (!hasSize(expr) && !/\{(?:λ|lambda)\}/.test(expr)) return props.notify('only a family ({n}, {k} or {λ} in it) can be kept in the expression library', 'error');
        return setField('name');
      }
      if (input === 'x') {
        if (job.state.status !== 'running' && family.state.status !== 'running') return props.notify('nothing is running');
        family.cancel();
        return job.cancel();
      }
      if (input === '+' || input === '=' || input === '-') {
        if (!hasSize(expr)) return props.notify('+/- change {n}; this expression has no {n}', 'error');
        const next = Math.min(8, Math.max(1, size + (input === '-' ? -1 : 1)));
        if (next === size) return props.notify(`{n} goes from 1 to 8`, 'error');
        // A result of another size no longer belongs here.
        job.clear();
        family.clear();
        return setSize(next);
      }
      scroll.handle(input, key, true);
    },
    props.active && field === undefined,
  );

  const w = props.width;
  const st = job.state;
  const result = st.status === 'done' ? st.result : undefined;
  const col = st.status === 'error' && st.error ? errorColumn(st.error) : undefined;
  const top: SLine[] = [];
  if (!SYMFUN_ENGINE_AVAILABLE) top.push(...wrapLine(line('The symmetric-function engine (src/symfun expressions) is not available in this build; nothing can be evaluated here.', 'warn'), w));
  if (field !== 'expr') top.push(...wrapLine([{ text: 'sym ', style: 'dim' }, { text: expr }], w, 4));
  const mid: SLine[] = [];
  if (hasSize(expr)) {
    const k = expr.includes('{k}');
    mid.push(...wrapLine(line(`{n} = ${size}${k ? `, {k} = ${middleK(size)}` : ''} (+/- changes it; Enter evaluates there; g searches n = 1..${size}${k ? ', all k' : ''}; a keeps it in the expression library)`, 'dim'), w, 2));
  }
  if (add.state.status === 'error') mid.push(...wrapLine(line(`✗ ${add.state.error}`, 'error'), w, 2));
  else if (add.state.status === 'running') mid.push(line(`evaluating the family for n = 1..${size}…`, 'dim'));
  if (family.state.status === 'error') mid.push(...wrapLine(line(`✗ ${family.state.error}`, 'error'), w, 2));
  else if (family.state.status === 'running') mid.push(line('building the target over n… (x cancels)', 'dim'));
  if (st.status === 'running') mid.push(line('evaluating… (x cancels)', 'dim'));
  else if (st.status === 'cancelled') mid.push(line('Cancelled. Enter evaluates again.', 'warn'));
  else if (st.status === 'error') {
    if (col !== undefined && !hasSize(expr)) mid.push(...caretLines(expr, col, w));
    mid.push(...wrapLine(line(`✗ ${st.error}`, 'error'), w, 2));
  } else if (result) {
    const degree = result.degree !== undefined ? `, degree ${result.degree}` : '';
    mid.push(...wrapLine(line(`${result.expression} in the Schur basis${degree} (${(result.elapsedMs / 1000).toFixed(2)}s; g sends it to the search):`, 'ok'), w, 2));
  } else mid.push(...wrapLines([line('Enter evaluates; e edits.', 'dim'), line(FORMS, 'dim')], w, 2));
  const terms = result ? result.lines.flatMap((l) => splitTerms(l)) : [];
  const body = wrapLines(terms.map((t, i) => line(i === 0 || t.startsWith('+') || t.startsWith('-') ? `  ${t}` : t)), w, 6);
  const room = Math.max(3, props.height - top.length - (field === 'expr' ? 1 : 0) - mid.length);
  const win = scroll.view(body, room, undefined, ['↑/PgUp', '↓/PgDn']);
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'name' ? (
        <LineInput
          label="keep as family"
          initial="my-family"
          active
          width={w}
          onSubmit={(v) => {
            setField(undefined);
            add.run(
              (onProgress) => startAddFamily(v.trim(), expr, size, cataloguePath(undefined, props.env, props.cwd), onProgress),
              (r) => props.notify(r.text),
            );
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      {field === 'expr' ? (
        <LineInput
          label="sym"
          initial={expr}
          active
          width={w}
          onSubmit={(v) => {
            setField(undefined);
            setExpr(v);
            evaluate(v);
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      <Lines lines={[...mid, ...win.lines]} />
    </Box>
  );
}
