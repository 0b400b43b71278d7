import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { IMAGE, ImageAdapter } from './image.adapter';

@Global()
@Module({
  providers: [{ provide: IMAGE, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new ImageAdapter(cfg.MAX_IMAGE_PIXELS) }],
  exports: [IMAGE],
})
export class ImageModule {}
