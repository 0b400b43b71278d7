export { BackgroundWorkModule } from './background-work.module';
