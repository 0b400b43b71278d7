import { Inject, Injectable } from '@nestjs/common';
import type { AnnotatedSize } from '@benchproof/contracts';
import { type FileToSend, notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { AnnotationRenderService } from './annotation-render.service';

/** Serves annotated renders: private, revalidated each time (a new version changes the ETag). */
@Injectable()
export class AnnotationFilesService {
  constructor(
    private readonly render: AnnotationRenderService,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  async open(shopId: number, assetId: number, size: AnnotatedSize): Promise<FileToSend> {
    const img = await this.render.annotated(shopId, assetId, size);
    const stat = await this.storage.stat(img.key);
    if (!stat) throw notFound('Media file');
    return {
      size: stat.bytes,
      etag: `"a${assetId}-v${img.version}-${size}"`,
      contentType: 'image/jpeg',
      cacheControl: 'private, no-cache',
      disposition: `inline; filename="media-${assetId}-annotated-${size}.jpg"`,
      headers: { 'X-Annotation-Version': String(img.version) },
      open: (range) => this.storage.createReadStream(img.key, range),
    };
  }
}
