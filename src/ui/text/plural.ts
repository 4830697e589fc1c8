/** "1 candidate", "2 candidates", "1 family", "3 families". */
export function plural(n: number | bigint, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 || n === 1n ? one : many}`;
}
