// Minimal argument parsing for the Lamina command line: positional files and --flag [value].

export interface ParsedArgs {
  files: string[];
  flags: Map<string, string | true>;
}

/** Flags that take no value. */
export const BOOLEAN_FLAGS = ['json', 'help', 'batch', 'jsonl'] as const;
const BOOLEAN = new Set<string>(BOOLEAN_FLAGS);

export function parseArgs(argv: readonly string[]): ParsedArgs {
  const files: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    if (a.startsWith('--')) {
      const [name, inline] = a.slice(2).split('=', 2) as [string, string | undefined];
      if (inline !== undefined) flags.set(name, inline);
      else if (BOOLEAN.has(name)) flags.set(name, true);
      else {
        const next = argv[i + 1];
        if (next === undefined || next.startsWith('--')) throw new Error(`--${name} needs a value`);
        flags.set(name, next);
        i++;
      }
    } else files.push(a);
  }
  return { files, flags };
}
