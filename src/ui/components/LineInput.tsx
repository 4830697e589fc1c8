/**
 * A one-line text field: typing (or pasting) inserts at the cursor, ←/→ Home/End move,
 * Backspace/Delete delete, Ctrl+U clears, Enter submits, Esc cancels (the screen keeps what
 * it had before). The field holds its own text, so keys arriving together all land. Text
 * wider than the field scrolls with the cursor, with … where it continues.
 */
import { Text } from 'ink';
import { useState } from 'react';
import { useKeys } from '../hooks.js';
import { useTheme } from '../ThemeContext.js';

export interface LineInputProps {
  readonly label: string;
  /** The text the field starts with. */
  readonly initial: string;
  readonly active: boolean;
  readonly width: number;
  onSubmit(value: string): void;
  onCancel(): void;
  /** Called on every change (a screen may check the text as it is typed). */
  onChange?(value: string): void;
}

export function LineInput(props: LineInputProps) {
  const theme = useTheme();
  const [state, setState] = useState({ text: props.initial, cursor: [...props.initial].length });
  const chars = [...state.text];
  const update = (text: string, cursor: number) => {
    setState({ text, cursor });
    if (text !== state.text) props.onChange?.(text);
  };
  useKeys(
    (input, key) => {
      const pos = Math.min(state.cursor, chars.length);
      if (key.return) return props.onSubmit(state.text);
      if (key.escape) return props.onCancel();
      if (key.tab) return;
      if (key.leftArrow) return update(state.text, Math.max(0, pos - 1));
      if (key.rightArrow) return update(state.text, Math.min(chars.length, pos + 1));
      if (key.home || (key.ctrl && input === 'a')) return update(state.text, 0);
      if (key.end || (key.ctrl && input === 'e')) return update(state.text, chars.length);
      if (key.ctrl && input === 'u') return update('', 0);
      if (key.backspace) {
        if (pos === 0) return;
        return update([...chars.slice(0, pos - 1), ...chars.slice(pos)].join(''), pos - 1);
      }
      if (key.delete) {
        if (pos >= chars.length) return;
        return update([...chars.slice(0, pos), ...chars.slice(pos + 1)].join(''), pos);
      }
      if (key.ctrl || key.meta || key.upArrow || key.downArrow || key.pageUp || key.pageDown || input === '') return;
      const add = [...input];
      update([...chars.slice(0, pos), ...add, ...chars.slice(pos)].join(''), pos + add.length);
    },
    props.active,
    { text: true },
  );
  const pos = Math.min(state.cursor, chars.length);
  // Room for the text beside the label, ">", a … on each side and the cursor mark.
  const room = Math.max(8, props.width - [...props.label].length - 5);
  const start = Math.max(0, Math.min(pos - room + 1, chars.length - room + 1));
  const visible = chars.slice(start, start + room);
  const left = start > 0;
  const right = start + room < chars.length;
  const at = pos - start;
  const before = visible.slice(0, at).join('');
  const under = visible[at] ?? ' ';
  const after = visible.slice(at + 1).join('');
  return (
    <Text wrap="truncate">
      <Text {...theme.style(props.active ? 'key' : 'dim')}>{props.label}&gt;</Text>
      <Text {...theme.style('dim')}>{left ? '…' : ''}</Text>
      {before}
      {theme.color ? <Text inverse>{under}</Text> : <Text>▏{under === ' ' ? '' : under}</Text>}
      {after}
      <Text {...theme.style('dim')}>{right ? '…' : ''}</Text>
    </Text>
  );
}
