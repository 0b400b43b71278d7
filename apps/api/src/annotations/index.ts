export { AnnotationsModule } from './annotations.module';
/** For the report, owner page and showcase: `annotated(shopId, assetId, 'screen' | 'print')` and `annotatedJpeg(...)`. */
export { AnnotationRenderService, type AnnotatedImage } from './annotation-render.service';
/** Mounted by app.factory.ts ahead of Nest's body parser: the save route's larger, computed body limit. */
export { annotationSaveBody } from './annotation-body';
