// `npm run calc -- <case.json> [--json] [--methods id,id,…]`: the same calculation contract as the
// page (src/compute/calcRequest.ts), in Node.
import { describeProblems } from '../io/caseFile';
import { PLAN_FORMAT } from '../io/planSchema';
import { loadGeneratedDataFromDisk } from '../io/generatedDataNode';
import { parseArgs } from './args';
import { runBatch, runJsonLines } from './batch';
import { calculateDocument, jsonOf, loadDocument, textOf, WATER_DATA_USAGE } from './checkCommand';
import { cliCalcOf } from './cliCalc';
import { WATER_TABLE_USAGE } from './waterTableArgs';
import { commandLineProblems, flagProblemsForDocument } from './flagRules';
import { readTextFileNoting } from './readTextFile';
import { MC_USAGE } from './mcArgs';
import { DICOM_USAGE, runDicomCommand } from './dicomCommand';

const USAGE = `Usage: npm run calc -- <case.json | plan.json> [--json] [--methods id,id,...]
       npm run calc -- --batch <file> <file> ...   (one summary row per file; exit 1 if any check fails or is uncertain)
       npm run calc -- --jsonl <file> <file> ...   (each file's full JSON document on one line)
       npm run calc -- --dicom DIR [--json] [--write-plan out.json]   (CT + RT Plan: prints lamina.plancalc)
  --json          print one JSON document (format "lamina.calc" with a "check" section; a plan
                  file prints "lamina.plancalc")
  --jsonl         one line per file: {"file", "document"} (the --json document) or {"file", "problems"}
  --methods LIST  comma-separated method ids to compute (default: all available)
  --tolerances H,X  check tolerances in % for homogeneous and heterogeneous paths (default 2,5)
  --prescribe P=D  total dose D (cGy) at point P from all beams: prints the MU per beam
  --check-method ID  method whose verdict decides the check (default: the superposition, or the
                  Monte Carlo when run, where a path crosses a heterogeneity; rtmr otherwise)
  --dose-to water|medium  dose convention of every method (default: the file's, else water)
${WATER_DATA_USAGE}
${WATER_TABLE_USAGE}
${MC_USAGE}
${DICOM_USAGE}`;

function main(argv: string[]): number {
  let args;
  try {
    args = parseArgs(argv);
  } catch (e) {
    console.error(`${(e as Error).message}\n${USAGE}`);
    return 2;
  }
  if (args.flags.has('help') || args.files.length === 0) {
    console.error(USAGE);
    return args.flags.has('help') ? 0 : 2;
  }
  const flagProblems = commandLineProblems(args);
  if (flagProblems.length > 0) {
    console.error(`${flagProblems.join('\n')}\n${USAGE}`);
    return 2;
  }
  const made = cliCalcOf(args.flags);
  if (!made.ok) {
    if (made.kind === 'water') console.error(`invalid water data\n${made.problems.join('\n')}`);
    else console.error(`${made.problems.join('\n')}\n${USAGE}`);
    return 2;
  }
  for (const line of made.notes) console.error(line);
  const calc = made.calc;
  const json = args.flags.get('json') === true;
  if (args.flags.get('jsonl') === true) return runJsonLines(args.files, calc);
  if (args.flags.get('batch') === true || args.files.length > 1)
    return runBatch(args.files, calc, json);
  const file = args.files[0] as string;
  const read = readTextFileNoting(file);
  if (!read.ok) {
    console.error(`${file}: ${read.problem}`);
    return 2;
  }
  const doc = loadDocument(read.text);
  const misfit = flagProblemsForDocument(doc, calc.options.prescription);
  if (misfit.length > 0) {
    console.error(`${file}: ${misfit.join('\n')}`);
    return 2;
  }
  const answer = calculateDocument(doc, calc);
  if (!answer.ok) {
    const isPlan = doc.ok && (doc.raw as { format?: unknown } | null)?.format === PLAN_FORMAT;
    console.error(
      `${file}: invalid ${isPlan ? 'plan' : 'case'} file\n${describeProblems(answer.problems)}`,
    );
    return 2;
  }
  if (json)
    process.stdout.write(`${JSON.stringify(jsonOf(answer.report, answer.isPlan), null, 2)}\n`);
  else process.stdout.write(`${textOf(answer.report, answer.isPlan)}\n`);
  return 0;
}

// The engine's generated data (kernels, modelled beams) is read once, before either command.
loadGeneratedDataFromDisk();
if (process.argv.some((a) => a === '--dicom' || a.startsWith('--dicom=')))
  void runDicomCommand(process.argv.slice(2), USAGE).then((code) => (process.exitCode = code));
else process.exitCode = main(process.argv.slice(2));
