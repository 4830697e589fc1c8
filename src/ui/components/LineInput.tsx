/**
 * A one-line text field: typing inserts at the cursor, ←/→ Home/End move, Backspace
 * deletes, Enter submits, Esc leaves. Drawn with a visible cursor mark so it reads the
 * same with and without colour.
 */
import { Text } from 'ink';
import { useRef, useState } from 'react';
import { useKeys } from '../hooks.js';
import { useTheme } from '../ThemeContext.js';

export interface LineInputProps {
  readonly label: string;
  readonly value: string;
  readonly active: boolean;
  readonly width: number;
  onChange(value: string): void;
  onSubmit(value: string): void;
  onLeave(): void;
}

export function LineInput(props: LineInputProps) {
  const theme = useTheme();
  const [cursor, setCursorState] = useState(props.value.length);
  // The latest text and cursor, so keys arriving faster than redraws all land; a value
  // set from outside (not one this field produced) replaces them.
  const live = useRef({ value: props.value, cursor: props.value.length });
  const lastProp = useRef(props.value);
  if (props.value !== lastProp.current) {
    lastProp.current = props.value;
    if (props.value !== live.current.value) live.current = { value: props.value, cursor: props.value.length };
  }
  const pos = Math.min(cursor, props.value.length);
  const setCursor = (c: number) => {
    live.current.cursor = c;
    setCursorState(c);
  };
  const change = (v: string) => {
    live.current.value = v;
    props.onChange(v);
  };
  useKeys(
    (input, key) => {
      const v = live.current.value;
      const pos = Math.min(live.current.cursor, v.length);
      if (key.return) return props.onSubmit(v);
      if (key.escape) return props.onLeave();
      if (key.tab) return;
      if (key.leftArrow) return setCursor(Math.max(0, pos - 1));
      if (key.rightArrow) return setCursor(Math.min(v.length, pos + 1));
      if (key.home || (key.ctrl && input === 'a')) return setCursor(0);
      if (key.end || (key.ctrl && input === 'e')) return setCursor(v.length);
      if (key.ctrl && input === 'u') {
        setCursor(0);
        return change('');
      }
      if (key.backspace || key.delete) {
        if (pos === 0) return;
        setCursor(pos - 1);
        return change(v.slice(0, pos - 1) + v.slice(pos));
      }
      if (key.ctrl || key.meta || key.upArrow || key.downArrow || key.pageUp || key.pageDown) return;
      // Printable text (a paste arrives as one string); control characters are dropped.
      const clean = input.replace(/[\u0000-\u001f\u007f]/g, '');
      if (clean === '') return;
      setCursor(pos + clean.length);
      change(v.slice(0, pos) + clean + v.slice(pos));
    },
    props.active,
  );
  const room = Math.max(8, props.width - props.label.length - 3);
  // Keep the cursor in view when the text is longer than the field.
  const start = Math.max(0, pos - room + 1);
  const shown = props.value.slice(start, start + room);
  const at = pos - start;
  if (!props.active) {
    return (
      <Text wrap="truncate">
        <Text {...theme.style('dim')}>{props.label} </Text>
        {shown}
      </Text>
    );
  }
  return (
    <Text wrap="truncate">
      <Text {...theme.style('key')}>{props.label}&gt;</Text>
      {shown.slice(0, at)}
      <Text inverse={theme.color}>{theme.color ? (shown[at] ?? ' ') : '▏'}</Text>
      {theme.color ? shown.slice(at + 1) : shown.slice(at)}
    </Text>
  );
}
