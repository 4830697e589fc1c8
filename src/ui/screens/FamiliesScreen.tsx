/**
 * Families: pick a family and its parameters; a scrolling list of its objects drawn by the
 * family's renderer, with the values of the chosen statistics beside each.
 */
import { Box, Text } from 'ink';
import { useMemo, useRef, useState } from 'react';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';
import { LineInput } from '../components/LineInput.js';
import { Unavailable } from '../components/Unavailable.js';
import { defaultParams, loadCatalog, statisticsOf } from '../engines/catalog.js';
import { paramsToText, parseParamsText } from '../engines/paramsText.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';

interface Stream {
  readonly key: string;
  readonly seen: unknown[];
  iterator: Iterator<unknown> | undefined;
  error: string | undefined;
}

/** Objects 0..upTo−1 of the family, generated lazily and kept for scrolling back. */
function take(stream: Stream, family: Family<unknown>, params: Params, upTo: number): void {
  if (stream.error !== undefined || stream.seen[stream.seen.length - 1] === DONE) return;
  try {
    stream.iterator ??= family.generate(params)[Symbol.iterator]();
    while (stream.seen.length < upTo) {
      const r = stream.iterator.next();
      if (r.done) {
        stream.iterator = undefined;
        stream.seen.push(DONE);
        return;
      }
      stream.seen.push(r.value);
    }
  } catch (e) {
    stream.error = errorText(e);
  }
}
const DONE = Symbol('done');

export function FamiliesScreen(props: ScreenProps) {
  const catalog = useMemo(loadCatalog, []);
  if (!catalog || catalog.families.length === 0) return <Unavailable what="The Families screen" engine="objects/ and statistics/ registries" />;
  return <FamiliesView {...props} families={catalog.families} statsOf={(id) => statisticsOf(catalog, id)} />;
}

function FamiliesView(props: ScreenProps & { families: readonly Family<unknown>[]; statsOf: (id: string) => readonly Statistic<unknown>[] }) {
  const theme = useTheme();
  const [fi, setFi] = useState(() => Math.max(0, props.families.findIndex((f) => f.id === 'permutations')));
  const family = props.families[fi]!;
  const stats = props.statsOf(family.id);
  const [paramsBy, setParamsBy] = useState<Record<string, Params>>({});
  const params = paramsBy[family.id] ?? defaultParams(family);
  const [chosen, setChosen] = useState<Record<string, string[]>>({});
  const chosenIds = chosen[family.id] ?? stats.slice(0, 2).map((s) => s.id);
  const chosenStats = chosenIds.map((id) => stats.find((s) => s.id === id)).filter((s): s is Statistic<unknown> => s !== undefined);
  const [offset, setOffset] = useState(0);
  const [field, setField] = useEditField<'params'>(props.active, props.setEditing);
  const [draft, setDraft] = useState('');
  const stream = useRef<Stream>({ key: '', seen: [], iterator: undefined, error: undefined });

  const key = `${family.id} ${paramsToText(params)}`;
  if (stream.current.key !== key) stream.current = { key, seen: [], iterator: undefined, error: undefined };
  let count: string;
  try {
    count = family.count(params).toString();
  } catch (e) {
    count = '?';
    stream.current.error ??= errorText(e);
  }

  const listHeight = Math.max(3, props.height - 5);
  take(stream.current, family, params, offset + listHeight + 1);
  const objs = stream.current.seen;
  const ended = objs[objs.length - 1] === DONE;
  const total = ended ? objs.length - 1 : Infinity;

  const cycleStat = (dir: 1 | 0) => {
    if (stats.length === 0) return;
    const ids = [...chosenIds];
    if (dir === 0 || ids.length === 0) {
      const free = stats.find((s) => !ids.includes(s.id));
      if (free) ids.push(free.id);
    } else {
      const last = ids.length - 1;
      const at = stats.findIndex((s) => s.id === ids[last]);
      for (let step = 1; step <= stats.length; step++) {
        const cand = stats[(at + step) % stats.length]!;
        if (!ids.includes(cand.id)) {
          ids[last] = cand.id;
          break;
        }
      }
    }
    setChosen({ ...chosen, [family.id]: ids });
  };

  useKeys(
    (input, k) => {
      if (k.leftArrow || k.rightArrow) {
        setFi((fi + (k.leftArrow ? props.families.length - 1 : 1)) % props.families.length);
        setOffset(0);
      } else if (k.downArrow) setOffset((o) => Math.min(o + 1, Math.max(0, total - 1)));
      else if (k.upArrow) setOffset((o) => Math.max(0, o - 1));
      else if (k.pageDown) setOffset((o) => Math.min(o + listHeight, Math.max(0, total - 1)));
      else if (k.pageUp) setOffset((o) => Math.max(0, o - listHeight));
      else if (input === 'p') {
        setDraft(paramsToText(params));
        setField('params');
      } else if (input === 's') cycleStat(1);
      else if (input === 'a') cycleStat(0);
      else if (input === 'd') setChosen({ ...chosen, [family.id]: chosenIds.slice(0, -1) });
    },
    props.active && field === undefined,
  );

  const submitParams = (text: string) => {
    try {
      const p = parseParamsText(text, family.params);
      family.validate(p);
      setParamsBy({ ...paramsBy, [family.id]: p });
      setOffset(0);
      setField(undefined);
      props.notify(`${family.id}: ${paramsToText(p)}`);
    } catch (e) {
      props.notify(errorText(e), 'error');
    }
  };

  // Draw objects from the offset until the list area is full.
  const rows: { lines: string[]; values: string }[] = [];
  let used = 0;
  for (let i = offset; i < objs.length && objs[i] !== DONE; i++) {
    const obj = objs[i];
    let lines: string[];
    let values: string;
    try {
      lines = family.render(obj).split('\n');
      values = chosenStats.map((s) => `${s.id} ${s.compute(obj)}`).join('  ');
    } catch (e) {
      lines = [`(cannot draw: ${errorText(e)})`];
      values = '';
    }
    const h = lines.length + (lines.length > 1 ? 1 : 0);
    if (used + h > listHeight && rows.length > 0) break;
    rows.push({ lines, values });
    used += h;
  }
  const drawW = Math.min(Math.max(8, ...rows.flatMap((r) => r.lines.map((l) => l.length))) + 2, Math.floor(props.width * 0.6));

  return (
    <Box flexDirection="column">
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>family </Text>
        <Text {...theme.style('title')}>
          ◀ {family.id} ▶
        </Text>
        <Text> {paramsToText(params)} </Text>
        <Text {...theme.style('dim')}>
          ({count} objects, {fi + 1}/{props.families.length} families)
        </Text>
      </Text>
      <Text wrap="truncate" {...theme.style('dim')}>
        {family.description} — {family.source}
      </Text>
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>statistics </Text>
        {chosenStats.length ? chosenStats.map((s) => s.id).join(', ') : '(none: a adds one)'}
        <Text {...theme.style('dim')}> of {stats.length}</Text>
      </Text>
      {field === 'params' ? (
        <LineInput label="parameters" value={draft} active width={props.width} onChange={setDraft} onSubmit={submitParams} onLeave={() => setField(undefined)} />
      ) : (
        <Text wrap="truncate" {...theme.style('dim')}>
          {stream.current.error ? '' : `objects ${offset + 1}–${offset + rows.length}${ended ? ` of ${total}` : ''}`}
        </Text>
      )}
      {stream.current.error ? (
        <Text wrap="wrap" {...theme.style('error')}>
          {stream.current.error}
        </Text>
      ) : (
        rows.map((r, i) => (
          <Box key={i} flexDirection="row">
            <Box width={drawW} flexDirection="column">
              {r.lines.map((l, j) => (
                <Text key={j} wrap="truncate">
                  {l}
                </Text>
              ))}
            </Box>
            <Text wrap="truncate" {...theme.style('value')}>
              {r.values}
            </Text>
          </Box>
        ))
      )}
    </Box>
  );
}
