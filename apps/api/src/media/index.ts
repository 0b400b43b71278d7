export { MediaModule } from './media.module';
export { MediaService, type ShotForPairing, type UprightImage } from './media.service';
export { MediaIntakeService, type IncomingFile } from './media-intake.service';
export { MediaDerivativesService } from './media-derivatives.service';
export { MediaFilesService } from './media-files.service';
