import type { ValidityCheck } from './weir-types';

const formatted = (x: number) => Number(x.toPrecision(4)).toString();

/** One plain sentence for each check outside its range. */
export function validityWarnings(checks: readonly ValidityCheck[]): string[] {
  return checks
    .filter((c) => !c.ok)
    .map((c) => {
      const range =
        c.min !== undefined && c.max !== undefined
          ? `between ${formatted(c.min)} and ${formatted(c.max)}`
          : c.min !== undefined
            ? `at least ${formatted(c.min)}`
            : `at most ${formatted(c.max ?? 0)}`;
      return `The ${c.name} is ${formatted(c.value)}, outside the method's range (${range}); the result is an extrapolation.`;
    });
}
