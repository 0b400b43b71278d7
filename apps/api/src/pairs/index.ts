export { PairsModule } from './pairs.module';
export { PairsService } from './pairs.service';
