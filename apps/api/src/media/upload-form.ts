import { MEDIA_AREAS, MEDIA_PHASES, MEDIA_SOURCES } from '@benchproof/domain';
import type { IncomingFile } from './media-intake.service';

export const MAX_FILES_PER_BATCH = 20;

/** Multer's view of a file on disk → the intake's; the client's name is only metadata. */
export const toIncoming = (f: Express.Multer.File): IncomingFile => ({ path: f.path, originalName: f.originalname, size: f.size });

/** OpenAPI description of the multipart upload form (fields as UploadMetaSchema). */
export const UPLOAD_FORM = {
  type: 'object' as const,
  required: ['files', 'phase', 'area'],
  properties: {
    files: { type: 'array' as const, items: { type: 'string' as const, format: 'binary' } },
    phase: { type: 'string' as const, enum: [...MEDIA_PHASES] },
    area: { type: 'string' as const, enum: [...MEDIA_AREAS] },
    source: { type: 'string' as const, enum: [...MEDIA_SOURCES], default: 'upload' },
    caption: { type: 'string' as const, maxLength: 500 },
    sourceAssetId: { type: 'integer' as const, description: 'For a still grabbed from a video of this job' },
    timecodeMs: { type: 'integer' as const, description: 'Position of the still in the source video' },
    clientId: { type: 'string' as const, format: 'uuid', description: 'Made up by the device for one shot; sent again, the stored asset is answered' },
  },
};
