/**
 * npm run advise -- FILE.json [--documents]
 * Reads an advisor input (README "Placement advisor"; examples/advisor/), searches truck position,
 * heading and leg extensions, and prints the three best placements with their figures as JSON on stdout
 * (with --documents, each proposal carries the whole scene with it applied). Bad input: a message naming
 * the field on stderr, exit code 2.
 */
import fs from 'node:fs';
import { advise, AdvisorInputError } from '@/lib/advisor';
import { siteFromFile } from '@/lib/advisor/input';
import { CAUTION_LINES } from '@/lib/caution';

function fail(message: string): never {
  process.stderr.write(`advise: ${message}\n`);
  process.exit(2);
}

const args = process.argv.slice(2);
const withDocuments = args.includes('--documents');
const file = args.find((a) => !a.startsWith('--'));
if (!file) fail('usage: npm run advise -- FILE.json [--documents]');

let json: unknown;
try {
  json = JSON.parse(file === '-' ? fs.readFileSync(0, 'utf8') : fs.readFileSync(file, 'utf8'));
} catch (e) {
  fail(`cannot read ${file} as JSON: ${(e as Error).message}`);
}
const parsed = siteFromFile(json);
if (!parsed.ok) fail(`invalid input\n  ${parsed.issues.slice(0, 5).map((i) => `${i.path || '(root)'}: ${i.message}`).join('\n  ')}`);
try {
  const r = advise(parsed.site);
  const proposals = r.proposals.map(({ document, ...p }) => (withDocuments ? { ...p, document } : p));
  // A margin of −Infinity (a figure that cannot be checked) prints as null.
  process.stdout.write(JSON.stringify({ ...r, proposals, caution: CAUTION_LINES }, null, 2) + '\n');
} catch (e) {
  if (e instanceof AdvisorInputError) fail(e.message);
  throw e;
}
