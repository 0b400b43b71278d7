export { ReportsModule } from './reports.module';
export { ReportsService, type IssuedReportFile } from './reports.service';
export { ANNOTATED_IMAGE_SOURCE, PAIRS_SOURCE, type AnnotatedImageSource, type PairsSource, type ReportPair } from './report-sources';
export type { ReportImage, ShotRef } from './report-data';
