/** The palindromic / unimodal flags of a target as one plain sentence. */
export function flagsText(r: { readonly palindromic: boolean; readonly unimodal: boolean }): string {
  return `${r.palindromic ? 'every entry is palindromic' : 'not every entry is palindromic'}; ${r.unimodal ? 'every entry is unimodal' : 'not every entry is unimodal'}`;
}
