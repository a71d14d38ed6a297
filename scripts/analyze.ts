/**
 * npm run analyze -- scene.json [--step 0.1]
 * Reads a lift input (the engine's contract, docs/engine.md), prints the analysis as JSON on stdout.
 * Bad input: a message naming the field on stderr, exit code 2.
 */
import fs from 'node:fs';
import { analyzeLift, isLiftError, liftInputSchema, MIN_STEP } from '@/lib/lift';

function fail(message: string): never {
  process.stderr.write(`analyze: ${message}\n`);
  process.exit(2);
}

const args = process.argv.slice(2);
const stepAt = args.indexOf('--step');
const step = stepAt >= 0 ? Number(args.splice(stepAt, 2)[1]) : undefined;
if (step !== undefined && !(step >= MIN_STEP && step <= 1)) fail(`--step must be a number of degrees from ${MIN_STEP} to 1`);
const file = args[0];
if (!file) fail('usage: npm run analyze -- scene.json [--step 0.1]');

let text: string;
try {
  text = file === '-' ? fs.readFileSync(0, 'utf8') : fs.readFileSync(file, 'utf8');
} catch (e) {
  fail(`cannot read ${file}: ${(e as Error).message}`);
}
let json: unknown;
try {
  json = JSON.parse(text);
} catch (e) {
  fail(`${file} is not valid JSON: ${(e as Error).message}`);
}
const parsed = liftInputSchema.safeParse(json);
if (!parsed.success) {
  const lines = parsed.error.issues.slice(0, 5).map((i) => `${i.path.map(String).join('.') || '(root)'}: ${i.message}`);
  fail(`invalid input\n  ${lines.join('\n  ')}`);
}
try {
  process.stdout.write(JSON.stringify(analyzeLift(parsed.data, { step }), null, 2) + '\n');
} catch (e) {
  if (isLiftError(e)) fail(`${e.field ? `${e.field}: ` : ''}${e.message} [${e.code}]`);
  throw e;
}
