export { IMAGE, ImageAdapter, DERIVATIVE_SIZES, type SizedVariant, type ImageCheck, type Rendition, type ExifToWrite } from './image.adapter';
export { ImageModule } from './image.module';
export type { ComposeRequest, NormalisedCrop } from './showcase-compose';
