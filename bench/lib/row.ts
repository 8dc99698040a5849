// One line of the benchmark table: a figure, its samples over repeated runs, and either a value,
// an error (the bench failed) or the reason it was not measured.

export interface BenchFigure {
  name: string;
  value: number;
  unit: string;
  note?: string;
}

/** What every bench/*.bench.ts module exports. */
export interface BenchModule {
  run(): Promise<BenchFigure[]>;
  /** How many times the runner calls run() (default 3); slow benches lower it. */
  repeats?: number;
}

export interface BenchRow {
  /** Module file or built-in measurement the figure comes from. */
  group: string;
  name: string;
  unit: string;
  samples: number[];
  /** Which statistic of the samples is the headline value (default: median). */
  stat?: 'median' | 'p95';
  note?: string;
  /** Set when the bench threw: its message. */
  error?: string;
  /** Set when the figure could not be measured: why. */
  notMeasured?: string;
}

export function errorRow(group: string, name: string, e: unknown): BenchRow {
  const message = e instanceof Error ? e.message.split('\n')[0] : String(e);
  return { group, name, unit: '', samples: [], error: message ?? 'unknown error' };
}

export function notMeasuredRow(group: string, name: string, reason: string): BenchRow {
  return { group, name, unit: '', samples: [], notMeasured: reason };
}
