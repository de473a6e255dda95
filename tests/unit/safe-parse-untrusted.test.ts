import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { newPasswordSchema, signInSchema } from '@/lib/validation/auth-schemas';
import { findNonPlainValue, safeParseUntrusted } from '@/lib/validation/safe-parse-untrusted';
import { DEEP, nestedArrays } from '../support/hostile-json';

describe('safeParseUntrusted', () => {
  it('reports, rather than throws, the values that make zod 4.6 length checks throw', () => {
    // The reason the guard exists: a `length` that cannot be compared with a number escapes zod's safeParse.
    expect(() => newPasswordSchema.safeParse({ length: Symbol('s') })).toThrow(TypeError);
    const result = safeParseUntrusted(newPasswordSchema, { length: Symbol('s') });
    expect(result.success).toBe(false);
    expect(result.error?.issues).toEqual([expect.objectContaining({ path: ['length'], message: expect.stringMatching(/plain data .* a symbol/) })]);

    const noPrototype = safeParseUntrusted(signInSchema, { email: 'a@b.org', password: { length: Object.create(null) as object } });
    expect(noPrototype.error?.issues[0]).toMatchObject({ path: ['password', 'length'], message: expect.stringContaining('without a prototype') });
  });

  it('names the field of a function in a list', () => {
    expect(findNonPlainValue({ events: [{ discharge: 3 }, { discharge: () => 3 }] })).toEqual({ path: ['events', 1, 'discharge'], kind: 'a function' });
  });

  it('passes plain data, dates and files to the schema unchanged', () => {
    const schema = z.object({ name: z.string().min(2), when: z.date(), file: z.instanceof(Blob), tags: z.array(z.string()) });
    const input = { name: 'Harrowfield', when: new Date(0), file: new Blob(['%PDF']), tags: ['a'] };
    expect(safeParseUntrusted(schema, input)).toEqual(schema.safeParse(input));
    expect(safeParseUntrusted(signInSchema, { email: 'x' }).error?.issues.map((i) => i.path)).toEqual(signInSchema.safeParse({ email: 'x' }).error?.issues.map((i) => i.path));
  });

  it('walks nesting deeper than the call stack, and cycles, without failing', () => {
    expect(findNonPlainValue(JSON.parse(nestedArrays(DEEP)))).toBeNull();
    const cyclic: Record<string, unknown> = { a: 1 };
    cyclic.self = cyclic;
    expect(findNonPlainValue(cyclic)).toBeNull();
  });
});
