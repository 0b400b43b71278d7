import type { IncomingFile } from './media-intake.service';

export const MAX_FILES_PER_BATCH = 20;

/** Multer's view of a file on disk → the intake's; the client's name is only metadata. */
export const toIncoming = (f: Express.Multer.File): IncomingFile => ({ path: f.path, originalName: f.originalname, size: f.size });
