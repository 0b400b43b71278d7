export { ShowcaseModule } from './showcase.module';
export { ShowcaseService } from './showcase.service';
