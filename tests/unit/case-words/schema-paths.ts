import type { z } from 'zod';

// Every field pattern a zod schema accepts: lists as `[]`, tuple positions as `[0]`, `[1]`…; the alternatives of a union merged.

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  element?: z.ZodType;
  items?: z.ZodType[];
  options?: z.ZodType[];
  innerType?: z.ZodType;
  in?: z.ZodType;
  out?: z.ZodType;
}

function defOf(schema: z.ZodType): Def {
  return (schema as unknown as { _zod: { def: Def } })._zod.def;
}

export function schemaPaths(schema: z.ZodType, prefix = '', out = new Set<string>()): Set<string> {
  const def = defOf(schema);
  const join = (key: string) => (prefix ? `${prefix}.${key}` : key);
  switch (def.type) {
    case 'object':
      for (const [key, child] of Object.entries(def.shape ?? {})) {
        out.add(join(key));
        schemaPaths(child, join(key), out);
      }
      break;
    case 'array':
      out.add(`${prefix}[]`);
      if (def.element) schemaPaths(def.element, `${prefix}[]`, out);
      break;
    case 'tuple':
      (def.items ?? []).forEach((item, i) => {
        out.add(`${prefix}[${i}]`);
        schemaPaths(item, `${prefix}[${i}]`, out);
      });
      break;
    case 'union':
      for (const option of def.options ?? []) schemaPaths(option, prefix, out);
      break;
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
    case 'nonoptional':
      if (def.innerType) schemaPaths(def.innerType, prefix, out);
      break;
    case 'pipe':
      if (def.in) schemaPaths(def.in, prefix, out);
      if (def.out) schemaPaths(def.out, prefix, out);
      break;
    default:
      break;
  }
  return out;
}
