export { AnnotationsModule } from './annotations.module';
/** For the report, owner page and showcase: `annotated(shopId, assetId, 'screen' | 'print')` and `annotatedJpeg(...)`. */
export { AnnotationRenderService, type AnnotatedImage } from './annotation-render.service';
