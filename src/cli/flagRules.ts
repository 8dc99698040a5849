// The command line's flags checked before anything is calculated: every flag known, none given
// an empty value, the Monte Carlo and water-data numbers within the page's and the case file's
// ranges, a check method that exists and is computed; then, per file, a prescription point that
// the file has. Each problem is one line naming the flag.
import { METHOD_IDS } from '../engine/methodRegistry';
import { prescriptionPointProblem, validatePlan } from '../io/planFile';
import type { ParsedDocument } from './checkCommand';
import { BOOLEAN_FLAGS, type ParsedArgs } from './args';
import { MC_FLAGS, mcFlagProblems } from './mcArgs';
import { WATER_TABLE_FLAGS } from './waterTableArgs';
import { DICOM_FLAG, DICOM_ONLY_FLAGS } from './dicomFlags';

/** Flags of the calc command that take a value. */
export const CALC_VALUE_FLAGS = [
  'methods',
  'tolerances',
  'prescribe',
  'check-method',
  'dose-to',
  'water-data',
] as const;

export const KNOWN_FLAGS: ReadonlySet<string> = new Set<string>([
  ...BOOLEAN_FLAGS,
  ...CALC_VALUE_FLAGS,
  ...WATER_TABLE_FLAGS,
  ...MC_FLAGS,
  DICOM_FLAG,
  ...DICOM_ONLY_FLAGS,
]);

/** Problems with the flags as given, independent of the files; empty when all is well. */
export function commandLineProblems(args: ParsedArgs): string[] {
  const problems: string[] = [];
  for (const [name, value] of args.flags) {
    if (!KNOWN_FLAGS.has(name)) {
      problems.push(`--${name}: unknown option`);
      continue;
    }
    const isBoolean = (BOOLEAN_FLAGS as readonly string[]).includes(name);
    if (isBoolean && value !== true) problems.push(`--${name}: takes no value`);
    if (!isBoolean && (value === true || value.trim() === ''))
      problems.push(`--${name}: needs a value (given empty)`);
  }
  if (problems.length > 0) return problems;
  if (!args.flags.has(DICOM_FLAG))
    for (const name of DICOM_ONLY_FLAGS)
      if (args.flags.has(name)) problems.push(`--${name}: only with --dicom DIR`);
  problems.push(...mcFlagProblems(args.flags));
  const method = args.flags.get('check-method');
  if (typeof method === 'string') {
    const methods = args.flags.get('methods');
    const asked = typeof methods === 'string' ? methods.split(',').map((s) => s.trim()) : undefined;
    if (!(METHOD_IDS as readonly string[]).includes(method))
      problems.push(
        `--check-method ${method}: unknown method (expected one of ${METHOD_IDS.join(', ')})`,
      );
    else if (asked && !asked.includes(method))
      problems.push(
        `--check-method ${method}: not among the methods asked for (--methods ${asked.join(',')})`,
      );
    else if (method === 'monte-carlo' && !args.flags.has('mc-histories'))
      problems.push(
        '--check-method monte-carlo: needs --mc-histories (no Monte Carlo run otherwise)',
      );
  }
  return problems;
}

/**
 * Problems of the flags against one parsed file (a prescription point no beam has), with the
 * plan files' own rule (src/io/planFile prescriptionPointProblem). An invalid file is left to the
 * calculation, which lists its problems.
 */
export function flagProblemsForDocument(
  doc: ParsedDocument,
  prescription: { pointId: string; doseCGy: number } | undefined,
): string[] {
  if (!doc.ok || !prescription) return [];
  const plan = validatePlan(doc.raw);
  if (!plan.ok) return [];
  const p = prescriptionPointProblem(plan.value.beams, prescription.pointId);
  return p ? [`--prescribe ${prescription.pointId}=${prescription.doseCGy}: ${p}`] : [];
}
