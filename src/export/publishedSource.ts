/**
 * What an export says about where a definition comes from: published sources only (a paper or
 * book with its theorem or section, "common practice", "from memory"). A reference to a file of
 * notes (any `*.md` file, e.g. a project's own notes) is not a source a reader can look up, so
 * such parts of a source string are left out; a source left empty says so.
 */

const NOTES_FILE = /\b[\w.-]+\.md\b/i;

/** Keep the parts (separated by ";") that cite no notes file; drop a notes citation in parentheses. */
export function publishedSource(source: string): string {
  const parts = source
    .split(';')
    .map((p) => p.replace(/\s*\([^()]*\.md\b[^()]*\)/gi, '').trim())
    .filter((p) => p !== '' && !NOTES_FILE.test(p));
  return parts.length ? parts.join('; ') : 'no published source recorded';
}

/** Text of a definition with any parenthesised notes-file citation removed. */
export function withoutNotesCitations(text: string): string {
  return text.replace(/\s*\([^()]*\.md\b[^()]*\)/gi, '');
}

export function citesNotesFile(text: string): boolean {
  return NOTES_FILE.test(text);
}
