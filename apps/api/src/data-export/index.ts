export { DataExportModule } from './data-export.module';
