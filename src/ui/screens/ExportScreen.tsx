/**
 * Export: choose a result and a format, write the file, see where it went; save the session's
 * results to a session file, or open one. The selection follows the result itself (by id), so a
 * result arriving meanwhile never moves the highlight or changes the file name.
 */
import { Box } from 'ink';
import { isAbsolute, resolve } from 'node:path';
import { useEffect, useState } from 'react';
import { LineInput } from '../components/LineInput.js';
import { Lines } from '../components/Lines.js';
import { defaultFileName, EXPORT_ENGINE_AVAILABLE, exportable, exportItem, formatsFor, type ExportFormat } from '../engines/exporter.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { unsavedCount } from '../session.js';
import { plural } from '../text/plural.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { useEditField } from '../useEditField.js';
import { useScroll } from '../useScroll.js';

interface Written {
  readonly key: string;
  readonly text: string;
  readonly ok: boolean;
}

export function ExportScreen(props: ScreenProps) {
  const items = props.session.items.filter(exportable).slice().reverse();
  const [selId, setSelId] = useState<number | undefined>(undefined);
  const [formatName, setFormatName] = useState<ExportFormat>('markdown');
  const [names, setNames] = useState<Record<string, string>>({});
  const [field, setField] = useEditField<'name' | 'open'>(props.active, props.setEditing);
  const [last, setLast] = useState<Written | undefined>(undefined);
  const scroll = useScroll();
  // Until the user picks a result here, the newest is selected while the screen is hidden;
  // once shown (or picked), the selection stays on that result whatever arrives later.
  const [picked, setPicked] = useState(false);
  const newest = items[0]?.id;
  useEffect(() => {
    const missing = selId === undefined || !items.some((x) => x.id === selId);
    if (newest !== undefined && (missing || (!props.active && !picked))) setSelId(newest);
  }, [selId, items, newest, props.active, picked]);
  const at = Math.max(0, items.findIndex((x) => x.id === selId));
  const item = items[at];
  const formats = item ? formatsFor(item) : [];
  const format: ExportFormat = formats.includes(formatName) ? formatName : (formats[0] ?? 'json');
  const nameKey = item ? `${item.id}:${format}` : '';
  const fileName = item ? (names[nameKey] ?? defaultFileName(item, format)) : '';
  const path = fileName === '' ? '' : isAbsolute(fileName) ? fileName : resolve(props.cwd, fileName);

  const write = (force: boolean) => {
    if (!item) return props.notify('nothing to export yet: compute something first', 'error');
    try {
      const done = exportItem(item, format, path, force);
      setLast({ key: nameKey, text: `✓ wrote ${done.bytes} bytes to ${done.path}`, ok: true });
      props.notify(`written: ${done.path}`);
    } catch (e) {
      setLast({ key: nameKey, text: `✗ ${errorText(e, 'export')}`, ok: false });
      props.notify(errorText(e, 'export'), 'error');
    }
  };

  useKeys(
    (input, key) => {
      if (key.upArrow || key.downArrow) {
        const next = items[Math.max(0, Math.min(items.length - 1, at + (key.upArrow ? -1 : 1)))];
        if (next) setSelId(next.id);
        return setPicked(true);
      }
      if (key.leftArrow || key.rightArrow) {
        if (formats.length === 0) return;
        const i = formats.indexOf(format);
        return setFormatName(formats[(i + (key.leftArrow ? formats.length - 1 : 1)) % formats.length]!);
      }
      if (key.return) return write(false);
      if (input === 'f') return write(true);
      if (input === 'e') {
        if (!item) return props.notify('nothing to export yet: compute something first', 'error');
        return setField('name');
      }
      if (input === 'w' || input === 'W') {
        if (props.session.items.length === 0) return props.notify('the session holds no results yet', 'error');
        return void props.saveSession(props.sessionPath, input === 'W');
      }
      if (input === 'o') return setField('open');
      scroll.handle(input, key, false);
    },
    props.active && field === undefined,
  );

  const w = props.width;
  const top: SLine[] = [];
  if (!EXPORT_ENGINE_AVAILABLE) top.push(...wrapLine(line('The export engine (src/export) is not available in this build; nothing can be written here.', 'warn'), w));
  top.push([
    { text: 'format ', style: 'dim' },
    ...formats.map((f) => (f === format ? { text: `[${f}]`, style: 'selected' as const } : { text: ` ${f} `, style: 'dim' as const })),
    ...(formats.length === 0 ? [{ text: '—', style: 'dim' as const }] : []),
  ]);
  if (field !== 'name') top.push(...wrapLine([{ text: 'file ', style: 'dim' }, { text: path || '—' }], w, 5));
  const mid: SLine[] = [];
  if (last && last.key === nameKey) mid.push(...wrapLine(line(last.text, last.ok ? 'ok' : 'error'), w, 2));
  const unsaved = unsavedCount(props.session);
  if (field !== 'open') {
    mid.push(
      ...wrapLine(
        [
          { text: 'session ', style: 'dim' },
          { text: props.sessionPath },
          { text: ` (${plural(props.session.items.length, 'result')}, ${unsaved} not saved; w saves, o opens a session file)`, style: 'dim' },
        ],
        w,
        8,
      ),
    );
  }
  mid.push(line(`results (${items.length}), newest first:`, 'dim'));
  const list: SLine[] = [];
  let focus: [number, number] = [0, 0];
  if (items.length === 0) list.push(...wrapLine(line('none yet: compute a module, a distribution or an expression, or run a search', 'warn'), w, 2));
  items.forEach((x, i) => {
    const sel = i === at;
    const rows = wrapLine([{ text: sel ? '▶ ' : '  ' }, { text: `${x.origin.padEnd(10)} ${x.title}`, ...(sel ? { style: 'selected' as const } : {}) }], w, 13);
    if (sel) focus = [list.length, list.length + rows.length - 1];
    list.push(...rows);
  });
  const room = Math.max(3, props.height - top.length - mid.length - (field ? 1 : 0));
  const win = scroll.view(list, room, focus);
  return (
    <Box flexDirection="column">
      <Lines lines={top} />
      {field === 'name' ? (
        <LineInput
          label="file"
          initial={fileName}
          active
          width={w}
          onSubmit={(v) => {
            if (v.trim() === '') return props.notify('give a file name (Esc keeps the old one)', 'error');
            setNames({ ...names, [nameKey]: v.trim() });
            setField(undefined);
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      {field === 'open' ? (
        <LineInput
          label="open session"
          initial={props.sessionPath}
          active
          width={w}
          onSubmit={(v) => {
            if (props.openSession(isAbsolute(v.trim()) ? v.trim() : resolve(props.cwd, v.trim()))) setField(undefined);
          }}
          onCancel={() => setField(undefined)}
        />
      ) : null}
      <Lines lines={[...mid, ...win.lines]} />
    </Box>
  );
}
