import { Inject, Injectable } from '@nestjs/common';
import type { ShopSettingsDto } from '@benchproof/contracts';
import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import { MediaIntakeService, type IncomingFile } from '../media';
import { ShopsService } from '../shops';

/** Logo long edge: 56 pt tall on the cover at ~300 dpi is ~240 px; 600 px leaves room for wide marks. */
const LOGO_LONG_EDGE = 600;

/**
 * The report logo, a shop-level image: checked by the media intake (type from the
 * bytes, size, full decode under the pixel limit), then made into one upright,
 * metadata-free JPEG by the same image adapter as every derivative.
 */
@Injectable()
export class BrandingService {
  constructor(
    private readonly intake: MediaIntakeService,
    private readonly shops: ShopsService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  async setLogo(actor: AuthUser, file: IncomingFile | undefined): Promise<ShopSettingsDto> {
    try {
      if (!file) throw new DomainError('VALIDATION_FAILED', 'Attach the logo in the "file" field.');
      await this.intake.validateImage(file);
      const out = await this.image.rendition(file.path, LOGO_LONG_EDGE);
      const stored = await this.storage.put(`logos/${actor.shopId}/${randomUUID()}.jpg`, Readable.from([out.data]));
      // The previous logo file is kept: drafts made before the change still point at it.
      return this.shops.setLogo(actor, { key: stored.key, sha256: stored.sha256, width: out.width, height: out.height }).settings;
    } finally {
      if (file) await this.intake.discard(file);
    }
  }

  removeLogo(actor: AuthUser): ShopSettingsDto {
    return this.shops.setLogo(actor, null).settings;
  }

  logo(actor: AuthUser): { stream: Readable; sha256: string } {
    const logo = this.shops.logo(actor.shopId);
    if (!logo) throw notFound('Logo');
    return { stream: this.storage.createReadStream(logo.key), sha256: logo.sha256 };
  }
}
