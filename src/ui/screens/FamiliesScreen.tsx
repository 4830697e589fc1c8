/**
 * Families: pick a family and its parameters; a scrolling list of its objects drawn by the
 * family's renderer, with the values of the chosen statistics beside each. A drawing wider
 * than the window is cut with … and scrolls sideways; a statistic not defined on an object
 * shows — (and why, once) while the object is still drawn.
 */
import { Box } from 'ink';
import { useMemo, useRef, useState } from 'react';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { Unavailable } from '../components/Unavailable.js';
import { defaultParams, loadCatalog, statisticsOf } from '../engines/catalog.js';
import { paramsToText, parseParamsText } from '../engines/paramsText.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { cellWidth } from '../text/cellWidth.js';
import { line, sliceLine, wrapLine, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { objectsText } from './objectsText.js';

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
    stream.error = errorText(e, 'families');
  }
}
const DONE = Symbol('done');

export function FamiliesScreen(props: ScreenProps) {
  const catalog = useMemo(loadCatalog, []);
  if (!catalog || catalog.families.length === 0) return <Unavailable what="The Families screen" engine="objects/ and statistics/ registries" />;
  return <FamiliesView {...props} families={catalog.families} statsOf={(id) => statisticsOf(catalog, id)} />;
}

function FamiliesView(props: ScreenProps & { families: readonly Family<unknown>[]; statsOf: (id: string) => readonly Statistic<unknown>[] }) {
  const [fi, setFi] = useState(() => Math.max(0, props.families.findIndex((f) => f.id === 'permutations')));
  const family = props.families[fi]!;
  const stats = props.statsOf(family.id);
  const [paramsBy, setParamsBy] = useState<Record<string, Params>>({});
  const params = paramsBy[family.id] ?? defaultParams(family, 5000n, stats);
  const [chosen, setChosen] = useState<Record<string, string[]>>({});
  const chosenIds = chosen[family.id] ?? stats.slice(0, 2).map((s) => s.id);
  const chosenStats = chosenIds.map((id) => stats.find((s) => s.id === id)).filter((s): s is Statistic<unknown> => s !== undefined);
  const [offset, setOffset] = useState(0);
  const [side, setSide] = useState(0);
  const [field, setField] = useEditField<'params'>(props.active, props.setEditing);
  const stream = useRef<Stream>({ key: '', seen: [], iterator: undefined, error: undefined });
  const drawn = useRef({ page: 1, total: Infinity });

  const key = `${family.id} ${paramsToText(params)}`;
  if (stream.current.key !== key) stream.current = { key, seen: [], iterator: undefined, error: undefined };
  let counted: number | undefined;
  try {
    const c = family.count(params);
    counted = c <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(c) : undefined;
  } catch (e) {
    stream.current.error ??= errorText(e, 'families');
  }

  const cycleStat = (dir: 1 | 0) => {
    if (stats.length === 0) return props.notify(`${family.id} has no statistics yet`, 'error');
    const ids = [...chosenIds];
    if (dir === 0 || ids.length === 0) {
      const free = stats.find((s) => !ids.includes(s.id));
      if (!free) return props.notify(`all ${stats.length} statistics of ${family.id} are shown`);
      ids.push(free.id);
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
      const { page, total } = drawn.current;
      const last = Math.max(0, total - 1);
      if (k.leftArrow || k.rightArrow) {
        setFi((fi + (k.leftArrow ? props.families.length - 1 : 1)) % props.families.length);
        setOffset(0);
        setSide(0);
      } else if (k.downArrow) setOffset((o) => Math.min(o + 1, last));
      else if (k.upArrow) setOffset((o) => Math.max(0, o - 1));
      else if (k.pageDown) setOffset((o) => Math.min(o + page, last));
      else if (k.pageUp) setOffset((o) => Math.max(0, o - page));
      else if (k.home) setOffset(0);
      else if (input === '>' || input === '.') setSide((x) => x + 4);
      else if (input === '<' || input === ',') setSide((x) => Math.max(0, x - 4));
      else if (input === 'p') setField('params');
      else if (input === 's') cycleStat(1);
      else if (input === 'a') cycleStat(0);
      else if (input === 'd') {
        if (chosenIds.length === 0) return props.notify('no statistic to drop (a adds one)');
        setChosen({ ...chosen, [family.id]: chosenIds.slice(0, -1) });
      }
    },
    props.active && field === undefined,
  );

  const submitParams = (text: string) => {
    try {
      const p = parseParamsText(text, family.params);
      family.validate(p);
      setParamsBy({ ...paramsBy, [family.id]: p });
      setOffset(0);
      setSide(0);
      setField(undefined);
      props.notify(`${family.id}: ${paramsToText(p)}`);
    } catch (e) {
      props.notify(errorText(e, 'families'), 'error');
    }
  };

  const w = props.width;
  const top: SLine[] = [
    ...wrapLine(
      [
        { text: 'family ', style: 'dim' },
        { text: `◀ ${family.id} ▶`, style: 'title' },
        { text: ` ${paramsToText(params)} ` },
        { text: `(${objectsText(family, params)}; family ${fi + 1} of ${props.families.length})`, style: 'dim' },
      ],
      w,
      7,
    ),
    ...wrapLine(line(`${family.description} — ${family.source}`, 'dim'), w, 2),
    ...wrapLine([{ text: 'statistics ', style: 'dim' }, { text: chosenStats.length ? chosenStats.map((s) => s.id).join(', ') : '(none: a adds one)' }, { text: ` of ${stats.length}`, style: 'dim' }], w, 11),
  ];

  // Objects from the offset until the room is full; each drawn with its values.
  const room = Math.max(3, props.height - top.length - 1 - (field === 'params' ? 1 : 0));
  take(stream.current, family, params, offset + room + 1);
  const objs = stream.current.seen;
  const ended = objs[objs.length - 1] === DONE;
  const total = ended ? objs.length - 1 : (counted ?? Infinity);
  const off = Math.min(offset, Math.max(0, (ended ? total : objs.length) - 1));
  const undefinedWhy = new Map<string, string>();
  const rows: SLine[][] = [];
  for (let i = off; i < objs.length && objs[i] !== DONE; i++) {
    const obj = objs[i];
    let lines: string[];
    try {
      lines = family.render(obj).split('\n');
    } catch (e) {
      lines = [`(cannot draw: ${errorText(e, 'families')})`];
    }
    const values = chosenStats.map((s) => {
      try {
        return `${s.id} ${s.compute(obj)}`;
      } catch (e) {
        if (!undefinedWhy.has(s.id)) undefinedWhy.set(s.id, errorText(e, 'families'));
        return `${s.id} —`;
      }
    });
    const drawW = Math.max(...lines.map(cellWidth));
    const valueText = values.join('  ');
    const beside = drawW + 2 + cellWidth(valueText) <= w + side;
    const rowLines: SLine[] = lines.map((l, j) => (j === 0 && beside && valueText ? [{ text: l + ' '.repeat(drawW - cellWidth(l) + 2) }, { text: valueText, style: 'value' as const }] : line(l)));
    if (!beside && valueText) rowLines.push(line(`  ${valueText}`, 'value'));
    if (lines.length > 1 || !beside) rowLines.push([]);
    rows.push(rowLines);
  }
  const above = off;
  const notes: SLine[] = [...undefinedWhy].flatMap(([id, why]) => wrapLine(line(`${id} shows — where it is not defined: ${why}`, 'warn'), w, 2));
  const marks = (above > 0 ? 1 : 0) + 1;
  const listRoom = Math.max(2, room - notes.length - marks);
  const shown: SLine[] = [];
  let count = 0;
  for (const r of rows) {
    if (shown.length + r.length > listRoom) {
      if (count > 0) break;
      // One drawing taller than the room: its top, and how much is left out.
      shown.push(...r.slice(0, listRoom - 1), line(`… ${r.length - listRoom + 1} more lines of this object (a larger window shows it)`, 'dim'));
      count = 1;
      break;
    }
    shown.push(...r);
    count++;
  }
  const firstShown = off + 1;
  const lastShown = off + count;
  drawn.current = { page: Math.max(1, count), total };
  const below = Number.isFinite(total) ? total - lastShown : undefined;
  const body: SLine[] = [];
  if (stream.current.error) body.push(...wrapLine(line(`✗ ${stream.current.error}`, 'error'), w, 2));
  else {
    body.push(line(`objects ${firstShown}–${lastShown}${Number.isFinite(total) ? ` of ${total}` : ''}${side > 0 ? `, shifted ${side} columns (<)` : ''}`, 'dim'));
    body.push(...notes);
    if (above > 0) body.push(line(`↑ ${above} object${above === 1 ? '' : 's'} above (↑/PgUp)`, 'dim'));
    body.push(...shown.map((l) => sliceLine(l, side, w)));
    if (below === undefined || below > 0) body.push(line(`↓ ${below === undefined ? 'more objects' : `${below} more object${below === 1 ? '' : 's'}`} below (↓/PgDn)`, 'dim'));
  }
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'params' ? <LineInput label="parameters" initial={paramsToText(params)} active width={w} onSubmit={submitParams} onCancel={() => setField(undefined)} /> : null}
      <Lines lines={body} />
    </Box>
  );
}
