// `npm run calc -- <case.json> [--json] [--methods id,id,…]`: the same engine as the page, in Node.
import { readFileSync } from 'node:fs';
import { calculateCase } from '../compute/calculateCase';
import { describeProblems, parseCaseText } from '../io/caseFile';
import { parseArgs } from './args';
import { formatReport } from './formatReport';
import { WATER_TABLE_USAGE, waterTableFromFlags } from './waterTableArgs';

const USAGE = `Usage: npm run calc -- <case.json> [--json] [--methods id,id,...]
  --json          print one JSON document (format "lamina.calc")
  --methods LIST  comma-separated method ids to compute (default: all available)
${WATER_TABLE_USAGE}`;

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
  const file = args.files[0] as string;
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    console.error(`${file}: cannot read (${(e as Error).message})`);
    return 2;
  }
  const parsed = parseCaseText(text);
  if (!parsed.ok) {
    console.error(`${file}: invalid case file\n${describeProblems(parsed.problems)}`);
    return 2;
  }
  const methodsFlag = args.flags.get('methods');
  const methods =
    typeof methodsFlag === 'string'
      ? methodsFlag
          .split(',')
          .map((s) => s.trim())
          .filter(Boolean)
      : undefined;
  const table = waterTableFromFlags(args.flags);
  if (table && !table.ok) {
    console.error(`invalid water data\n${table.problems.join('\n')}`);
    return 2;
  }
  const report = calculateCase(parsed.value, {
    ...(methods ? { methods } : {}),
    ...(table ? { waterData: table.waterData } : {}),
  });
  if (args.flags.get('json') === true) process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
  else process.stdout.write(`${formatReport(report)}\n`);
  return 0;
}

process.exitCode = main(process.argv.slice(2));
