/** Text of user input as a message may echo it: control characters escaped, long text cut. */
export function shown(text: string, max = 80): string {
  // eslint-disable-next-line no-control-regex
  const safe = text.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, (c) => `\\x${c.charCodeAt(0).toString(16).padStart(2, '0')}`);
  return safe.length > max ? `${safe.slice(0, max)}… (${text.length} characters)` : safe;
}
