export { BikesModule } from './bikes.module';
export { BikesService } from './bikes.service';
