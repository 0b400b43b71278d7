export { SeedModule } from './seed.module';
export { SeedService } from './seed.service';
