import { Inject, Injectable } from '@nestjs/common';
import type { AnnotatedSize } from '@benchproof/contracts';
import type { Readable } from 'node:stream';
import { STORAGE, type Storage } from '../infra/storage';
import { AnnotationRenderService } from './annotation-render.service';

/** Serves annotated renders: private, revalidated each time (a new version changes the ETag). */
@Injectable()
export class AnnotationFilesService {
  constructor(
    private readonly render: AnnotationRenderService,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  async open(shopId: number, assetId: number, size: AnnotatedSize): Promise<{ headers: Record<string, string>; body: Readable }> {
    const img = await this.render.annotated(shopId, assetId, size);
    const stat = await this.storage.stat(img.key);
    return {
      headers: {
        'Content-Type': 'image/jpeg',
        'Cache-Control': 'private, no-cache',
        ETag: `"a${assetId}-v${img.version}-${size}"`,
        ...(stat ? { 'Content-Length': String(stat.bytes) } : {}),
        'Content-Disposition': `inline; filename="media-${assetId}-annotated-${size}.jpg"`,
        'X-Annotation-Version': String(img.version),
      },
      body: this.storage.createReadStream(img.key),
    };
  }
}
