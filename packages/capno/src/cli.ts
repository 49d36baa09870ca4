/**
 * `npm run analyze -- <input.json>`: prints the analysis as one JSON document and exits 0;
 * bad input exits 2 with a one-line message on stderr naming the field (CONTRACT.md
 * "Analysis on files"). The only file of the engine that does I/O.
 */
import { readFileSync } from 'node:fs';
import { analysisOutputSchema } from '@upstroke/contracts';
import { analyze } from './analyze.js';
import { parseAnalysisInput } from './input.js';

function fail(code: number, message: string): number {
  process.stderr.write(`${message}\n`);
  return code;
}

function main(args: readonly string[]): number {
  const file = args[0];
  if (!file) return fail(2, 'usage: npm run analyze -- <input.json>');
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (err) {
    return fail(2, `${file}: cannot read file (${(err as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  const result = parseAnalysisInput(text);
  if (!result.ok) return fail(2, result.message);
  const output = analysisOutputSchema.parse(analyze(result.input));
  process.stdout.write(`${JSON.stringify(output)}\n`);
  return 0;
}

process.exitCode = main(process.argv.slice(2));
