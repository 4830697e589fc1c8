/** Export: choose a result and a format, write the file, see where it went. */
import { Box, Text } from 'ink';
import { isAbsolute, resolve } from 'node:path';
import { useState } from 'react';
import { LineInput } from '../components/LineInput.js';
import { defaultFileName, EXPORT_ENGINE_AVAILABLE, exportable, exportItem, formatsFor, type ExportDone } from '../engines/exporter.js';
import { errorText } from '../errorText.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';
import { useEditField } from '../useEditField.js';

export function ExportScreen(props: ScreenProps) {
  const theme = useTheme();
  const items = props.session.items.filter(exportable).slice().reverse();
  const [sel, setSel] = useState(0);
  const [fi, setFi] = useState(0);
  const [names, setNames] = useState<Record<string, string>>({});
  const [field, setField] = useEditField<'name'>(props.active, props.setEditing);
  const [draft, setDraft] = useState('');
  const [last, setLast] = useState<{ done?: ExportDone; error?: string } | undefined>(undefined);
  const item = items[Math.min(sel, items.length - 1)];
  const formats = item ? formatsFor(item) : [];
  const format = formats[Math.min(fi, formats.length - 1)] ?? 'json';
  const nameKey = item ? `${item.id}:${format}` : '';
  const fileName = item ? (names[nameKey] ?? defaultFileName(item, format)) : '';
  const path = fileName === '' ? '' : isAbsolute(fileName) ? fileName : resolve(props.cwd, fileName);

  const write = (force: boolean) => {
    if (!item) return props.notify('nothing to export yet: compute something first', 'error');
    try {
      const done = exportItem(item, format, path, force);
      setLast({ done });
      props.notify(`written: ${done.path}`);
    } catch (e) {
      setLast({ error: errorText(e) });
      props.notify(errorText(e), 'error');
    }
  };

  useKeys(
    (input, key) => {
      if (key.upArrow) setSel((s) => Math.max(0, s - 1));
      if (key.downArrow) setSel((s) => Math.min(Math.max(0, items.length - 1), s + 1));
      const nf = Math.max(1, formats.length);
      if (key.leftArrow) setFi((f) => (Math.min(f, nf - 1) + nf - 1) % nf);
      if (key.rightArrow) setFi((f) => (Math.min(f, nf - 1) + 1) % nf);
      if (key.return) write(false);
      if (input === 'f') write(true);
      if (input === 'e' && item) {
        setDraft(fileName);
        setField('name');
      }
    },
    props.active && field === undefined,
  );

  const listH = Math.max(2, props.height - 7);
  const start = Math.max(0, Math.min(sel - listH + 1, items.length - listH));
  return (
    <Box flexDirection="column">
      {!EXPORT_ENGINE_AVAILABLE ? (
        <Text wrap="wrap" {...theme.style('warn')}>
          The export engine (src/export) is not available in this build; nothing can be written here.
        </Text>
      ) : null}
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>format </Text>
        {formats.map((f) => (
          <Text key={f} {...(f === format ? theme.style('selected') : theme.style('dim'))}>
            {f === format && !theme.color ? `[${f}]` : ` ${f} `}
          </Text>
        ))}
      </Text>
      {field === 'name' ? (
        <LineInput
          label="file"
          value={draft}
          active
          width={props.width}
          onChange={setDraft}
          onSubmit={(v) => {
            setNames({ ...names, [nameKey]: v.trim() });
            setField(undefined);
          }}
          onLeave={() => setField(undefined)}
        />
      ) : (
        <Text wrap="wrap">
          <Text {...theme.style('dim')}>file </Text>
          {path || '—'}
        </Text>
      )}
      <Text {...theme.style('dim')}>results ({items.length}), newest first:</Text>
      {items.length === 0 ? <Text {...theme.style('warn')}>none yet: compute a module, a distribution or an expression, or run a search</Text> : null}
      {items.slice(start, start + listH).map((x, i) => {
        const at = start + i;
        return (
          <Text key={x.id} wrap="truncate" {...(at === sel ? theme.style('selected') : {})}>
            {at === sel ? '▶ ' : '  '}
            {x.origin.padEnd(10)} {x.title}
          </Text>
        );
      })}
      {last?.done ? (
        <Text wrap="wrap" {...theme.style('ok')}>
          ✓ wrote {last.done.bytes} bytes to {last.done.path}
        </Text>
      ) : last?.error ? (
        <Text wrap="wrap" {...theme.style('error')}>
          ✗ {last.error}
        </Text>
      ) : null}
    </Box>
  );
}
