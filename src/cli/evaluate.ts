// npm run --silent evaluate -- FILE
// Prints the result of a Sillmark case file as one JSON document on stdout. On a problem, prints nothing on
// stdout and one line per problem on stderr, "field.path: message", and exits 2 (invalid input),
// 3 (no physical solution) or 1 (anything unexpected).
import { readFileSync } from 'node:fs';
import { EngineError, InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { parseCaseText } from '@/lib/validation/parse-case';

const EXIT = { ok: 0, unexpected: 1, invalidInput: 2, noPhysicalSolution: 3 } as const;

function fail(code: number, lines: string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(code);
}

function readCaseFile(path: string | undefined): string {
  if (!path) fail(EXIT.invalidInput, ['usage: npm run --silent evaluate -- CASE_FILE.json']);
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    const reason = error instanceof Error && 'code' in error && error.code === 'ENOENT' ? 'no such file' : error instanceof Error ? error.message : String(error);
    fail(EXIT.invalidInput, [`${path}: cannot read the case file (${reason})`]);
  }
}

function main(): void {
  const text = readCaseFile(process.argv[2]);
  const parsed = parseCaseText(text);
  if (!parsed.ok) fail(EXIT.invalidInput, parsed.issues.map((issue) => `${issue.path}: ${issue.message}`));
  try {
    process.stdout.write(`${JSON.stringify(evaluateCase(parsed.value), null, 2)}\n`);
  } catch (error) {
    if (error instanceof InvalidInputError) fail(EXIT.invalidInput, [error.message]);
    if (error instanceof NoPhysicalSolutionError) fail(EXIT.noPhysicalSolution, [error.message]);
    if (error instanceof EngineError) fail(EXIT.unexpected, [`${error.message} (engine error ${error.code})`]);
    fail(EXIT.unexpected, [`unexpected error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`]);
  }
}

main();
