import { saveAnnotationMaxBytes } from '@benchproof/contracts';
import { json, type NextFunction, type Request, type Response } from 'express';

/** The save route's path under the global prefix, e.g. PUT /api/annotations/12. */
const SAVE_PATH = /^\/api\/annotations\/\d+$/;

/**
 * JSON parser for annotation saves with a limit worked out from the schema (the largest
 * valid save, ~1.5 MB), where every other route keeps the default 100 kB. Mounted before
 * Nest's own parser, which then sees the body as read. The function is named so Nest does
 * not take it for its global `jsonParser` and skip that one.
 */
export function annotationSaveBody(): (req: Request, res: Response, next: NextFunction) => void {
  const parse = json({ limit: saveAnnotationMaxBytes() });
  return function annotationSaveBodyParser(req, res, next) {
    if (req.method === 'PUT' && SAVE_PATH.test(req.path)) parse(req, res, next);
    else next();
  };
}
