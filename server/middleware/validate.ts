import type { NextFunction, Request, Response } from 'express';
import { type ValidationChain, validationResult } from 'express-validator';

import { invalid } from '../errors';
import { nonScalarFields } from './scalar-fields';

// Runs express-validator chains and refuses the request with every failing field named,
// before any route code (and so any write) runs. A list or object where a single value belongs
// is refused for every route here, in one place.
export function validate(...chains: ValidationChain[]) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const notScalar = nonScalarFields(req, chains);
    for (const chain of chains) await chain.run(req);
    const result = validationResult(req);
    if (result.isEmpty() && Object.keys(notScalar).length === 0) return next();
    const fields: Record<string, string> = { ...notScalar };
    for (const error of result.array()) {
      // rooms[0].name → rooms.0.name, the form library's and the pre-submit checks' spelling.
      const name = error.type === 'field' ? error.path.replace(/\[(\d+)\]/g, '.$1') : error.type;
      fields[name] ??= String(error.msg);
    }
    next(invalid(fields));
  };
}
