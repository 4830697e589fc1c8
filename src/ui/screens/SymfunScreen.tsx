/**
 * Symmetric functions: type an expression of the `gradus sym` language, see the result in
 * the Schur basis; a parse error is pointed at its column under the expression.
 */
import { Box, Text } from 'ink';
import { useState } from 'react';
import { seriesFromJson } from '../../series/seriesJson.js';
import { makeTarget } from '../../series/target.js';
import { LineInput } from '../components/LineInput.js';
import { atSize, errorColumn, hasSize, middleK, startAddFamily, startSym, startSymTarget, SYMFUN_ENGINE_AVAILABLE, type SymOutcome } from '../engines/symfun.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import type { Target } from '../../series/target.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';
import { useJob } from '../useJob.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';

export const DEFAULT_EXPRESSION = 'nabla(e({n}))';

export function SymfunScreen(props: ScreenProps) {
  const theme = useTheme();
  const [expr, setExpr] = useState(DEFAULT_EXPRESSION);
  const [field, setField] = useEditField<'expr' | 'name'>(props.active, props.setEditing);
  const [name, setName] = useState('my-family');
  const add = useJob<{ text: string }>();
  const [offset, setOffset] = useState(0);
  const job = useJob<SymOutcome>();
  const family = useJob<Target>();
  const [evaluated, setEvaluated] = useState(expr);
  const [size, setSize] = useState(3);

  const evaluate = (text: string) => {
    setEvaluated(text);
    setOffset(0);
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
      props.notify(errorText(e), 'error');
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
      if (input === 'x' && (job.state.status === 'running' || family.state.status === 'running')) {
        family.cancel();
        return job.cancel();
      }
      if ((input === '+' || input === '=' || input === '-') && hasSize(expr)) return setSize((n) => Math.min(8, Math.max(1, n + (input === '-' ? -1 : 1))));
      if (key.downArrow) setOffset((o) => o + 1);
      if (key.upArrow) setOffset((o) => Math.max(0, o - 1));
    },
    props.active && field === undefined,
  );

  const st = job.state;
  const col = st.status === 'error' && st.error ? errorColumn(st.error) : undefined;
  const lines = st.result?.lines ?? [];
  const room = Math.max(3, props.height - 5);
  const off = Math.min(offset, Math.max(0, lines.length - room));
  return (
    <Box flexDirection="column">
      {!SYMFUN_ENGINE_AVAILABLE ? (
        <Text wrap="wrap" {...theme.style('warn')}>
          The symmetric-function engine (src/symfun expressions) is not available in this build; nothing can be evaluated here.
        </Text>
      ) : null}
      {field === 'name' ? (
        <LineInput
          label="keep as family"
          value={name}
          active
          width={props.width}
          onChange={setName}
          onSubmit={(v) => {
            setField(undefined);
            add.run(
              (onProgress) => startAddFamily(v.trim(), expr, size, cataloguePath(undefined, props.env, props.cwd), onProgress),
              (r) => props.notify(r.text),
            );
          }}
          onLeave={() => setField(undefined)}
        />
      ) : null}
      {add.state.status === 'error' ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {add.state.error}
        </Text>
      ) : add.state.status === 'running' ? (
        <Text {...theme.style('dim')}>evaluating the family for n = 1..{size}…</Text>
      ) : null}
      {field === 'expr' ? (
        <LineInput
          label="sym"
          value={expr}
          active
          width={props.width}
          onChange={setExpr}
          onSubmit={(v) => {
            setField(undefined);
            evaluate(v);
          }}
          onLeave={() => setField(undefined)}
        />
      ) : (
        <Text wrap="truncate">
          <Text {...theme.style('dim')}>sym </Text>
          {expr}
        </Text>
      )}
      {hasSize(expr) ? (
        <Text {...theme.style('dim')}>
          {'{n}'} = {size}{expr.includes('{k}') ? `, {k} = ${middleK(size)}` : ''} (+/- changes it; g searches n = 1..{size}{expr.includes('{k}') ? ', all k' : ''})
        </Text>
      ) : null}
      {family.state.status === 'error' ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {family.state.error}
        </Text>
      ) : family.state.status === 'running' ? (
        <Text {...theme.style('dim')}>building the target over n… (x cancels)</Text>
      ) : null}
      {col !== undefined && evaluated === expr && !hasSize(expr) ? (
        <Text {...theme.style('error')}>{' '.repeat(Math.max(0, col - 1) + 4)}^</Text>
      ) : null}
      {st.status === 'running' ? (
        <Text {...theme.style('dim')}>evaluating… (x cancels)</Text>
      ) : st.status === 'error' ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {st.error}
        </Text>
      ) : st.result ? (
        <Text wrap="truncate" {...theme.style('ok')}>
          = in the Schur basis{st.result.degree !== undefined ? `, degree ${st.result.degree}` : ''} ({(st.result.elapsedMs / 1000).toFixed(2)}s; g sends it to the search)
        </Text>
      ) : (
        <Text {...theme.style('dim')}>Enter evaluates; e edits. Forms: e(4) h(2,1) s(2,1) p(2,1) H(2,1) nabla(F) delta(f,F) deltaprime(f,F) omega(F) subs(F,t=0)</Text>
      )}
      {lines.slice(off, off + room).map((l, i) => (
        <Text key={i} wrap="truncate">
          {'  '}
          {l}
        </Text>
      ))}
      {lines.length > room ? <Text {...theme.style('dim')}>lines {off + 1}–{Math.min(lines.length, off + room)} of {lines.length} (↑/↓)</Text> : null}
    </Box>
  );
}
