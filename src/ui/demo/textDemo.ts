/** The demo session as plain text, for when there is no terminal to run the app in. */
export async function textDemo(out: (s: string) => void, _env: Readonly<Record<string, string | undefined>>): Promise<void> {
  out('gradus: no terminal on stdin/stdout, so here is the demo session as text.');
  out('Run gradus in a terminal for the app.');
}
