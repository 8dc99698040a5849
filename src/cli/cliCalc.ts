// What a file is calculated with on the command line, from the flags: the water source
// (--water-data, or a table from --tmr/--pdd), the check options (--methods, --tolerances,
// --prescribe, --check-method, --dose-to) and the Monte Carlo options. One place for a case or
// plan file and for a plan imported from DICOM (--dicom).
import { planOptionsOf, waterSourceOf, type CliCalc } from './checkCommand';
import { mcOptionsOf } from './mcArgs';
import { tableNoteLines, waterTableFromFlags } from './waterTableArgs';

export type CliCalcResult =
  /** `notes`: the measured table's sanity notes, for stderr (the page shows them under the table). */
  | { ok: true; calc: CliCalc; notes: string[] }
  /** `water`: the measured table's problems; `options`: a malformed flag (print the usage). */
  | { ok: false; kind: 'water' | 'options'; problems: string[] };

export function cliCalcOf(flags: Map<string, string | true>): CliCalcResult {
  const table = waterTableFromFlags(flags);
  if (table && !table.ok) return { ok: false, kind: 'water', problems: table.problems };
  try {
    return {
      ok: true,
      notes: tableNoteLines(table),
      calc: {
        water: waterSourceOf(
          flags,
          table?.ok && table.input ? { kind: 'table', table: table.input } : undefined,
        ),
        options: { ...planOptionsOf(flags), ...mcOptionsOf(flags) },
      },
    };
  } catch (e) {
    return { ok: false, kind: 'options', problems: [(e as Error).message] };
  }
}
