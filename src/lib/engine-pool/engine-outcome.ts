// What crosses the thread boundary: the result as UTF-8 JSON bytes, moved rather than copied (a result of some 100 KB
// as a string cost its clone on both threads and then an encoding on the way out), or an engine error as plain data (a
// class does not survive the structured clone, and the portal maps EngineError subclasses to their HTTP status by class).
import { EngineError, InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';

export type EngineOutcome =
  | { ok: true; resultJson: Uint8Array }
  | { ok: false; kind: 'invalid-input' | 'no-physical-solution' | 'engine'; field: string; code: string; message: string }
  | { ok: false; kind: 'too-deep'; message: string };

export function outcomeOfError(error: unknown): EngineOutcome {
  if (error instanceof InvalidInputError) return { ok: false, kind: 'invalid-input', field: error.field, code: error.code, message: error.message };
  if (error instanceof NoPhysicalSolutionError) return { ok: false, kind: 'no-physical-solution', field: error.field, code: error.code, message: error.message };
  if (error instanceof EngineError) return { ok: false, kind: 'engine', field: error.field, code: error.code, message: error.message };
  if (error instanceof RangeError && /call stack/i.test(error.message)) return { ok: false, kind: 'too-deep', message: error.message };
  throw error;
}

const reasonOf = (field: string, message: string) => (message.startsWith(`${field}: `) ? message.slice(field.length + 2) : message);

/** The engine error the worker caught, rebuilt as the same class with the same field, code and message. */
export function engineErrorOf(outcome: Extract<EngineOutcome, { kind: 'invalid-input' | 'no-physical-solution' | 'engine' }>): EngineError {
  if (outcome.kind === 'invalid-input') return new InvalidInputError(outcome.field, reasonOf(outcome.field, outcome.message));
  if (outcome.kind === 'no-physical-solution') return new NoPhysicalSolutionError(outcome.field, outcome.code, reasonOf(outcome.field, outcome.message));
  return new EngineError(outcome.message, outcome.field, outcome.code);
}
