export { InspectionModule } from './inspection.module';
export { InspectionService } from './inspection.service';
