/**
 * Words of a typed command line, as a shell would split them: spaces separate; single quotes
 * keep everything; double quotes keep spaces, and a backslash there escapes `"` or `\`.
 */
import { InputError } from '../core/errors.js';

export function splitWords(text: string, option = 'from'): string[] {
  const words: string[] = [];
  let word = '';
  let inWord = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === "'" || c === '"') {
      const close = c;
      inWord = true;
      let j = i + 1;
      for (; j < text.length && text[j] !== close; j++) {
        if (close === '"' && text[j] === '\\' && (text[j + 1] === '"' || text[j + 1] === '\\')) j++;
        word += text[j];
      }
      if (j >= text.length) throw new InputError(`--${option}: a ${close === '"' ? 'double' : 'single'} quote is not closed`, option);
      i = j;
    } else if (/\s/.test(c)) {
      if (inWord) words.push(word);
      word = '';
      inWord = false;
    } else {
      word += c;
      inWord = true;
    }
  }
  if (inWord) words.push(word);
  return words;
}
