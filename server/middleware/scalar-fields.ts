// One rule for every route: a field whose validators are all per-value checks (isIn, isInt,
// isBoolean, matches, …) must hold a single value. express-validator applies such checks to
// each element of an array, so without this ["accept"] would pass isIn(['accept']).
import type { Request } from 'express';
import type { ValidationChain } from 'express-validator';

type Item = { constructor: { name: string } };

// Chains with a custom validator (isArray, isObject, isString, custom…) see the whole value and
// judge its type themselves; only purely per-value chains need the guard.
function wantsScalar(chain: ValidationChain): { fields: string[]; locations: string[] } | null {
  const context = chain.builder.build() as unknown as { fields: string[]; locations: string[]; stack: Item[] };
  if (context.stack.some((item) => item.constructor.name === 'CustomValidation')) return null;
  if (!context.stack.some((item) => item.constructor.name === 'StandardValidation')) return null;
  return { fields: context.fields, locations: context.locations };
}

// The values a field path names, expanding `*` over arrays and objects.
function valuesAt(root: unknown, path: string): { path: string; value: unknown }[] {
  if (path === '') return [{ path, value: root }];
  let found: { path: string; value: unknown }[] = [{ path: '', value: root }];
  for (const part of path.replace(/\[(\d+|\*)\]/g, '.$1').split('.')) {
    found = found.flatMap(({ path: at, value }) => {
      if (value === null || typeof value !== 'object') return [];
      const join = (key: string) => (at ? `${at}.${key}` : key);
      if (part === '*') return Object.entries(value as Record<string, unknown>).map(([key, v]) => ({ path: join(key), value: v }));
      return Object.prototype.hasOwnProperty.call(value, part)
        ? [{ path: join(part), value: (value as Record<string, unknown>)[part] }]
        : [];
    });
  }
  return found;
}

export function nonScalarFields(req: Request, chains: ValidationChain[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const chain of chains) {
    const target = wantsScalar(chain);
    if (!target) continue;
    for (const location of target.locations) {
      const source = (req as unknown as Record<string, unknown>)[location];
      for (const field of target.fields) {
        for (const { path, value } of valuesAt(source, field)) {
          if (value !== null && typeof value === 'object') {
            fields[path] = Array.isArray(value) ? 'Must be a single value, not a list' : 'Must be a single value, not an object';
          }
        }
      }
    }
  }
  return fields;
}
