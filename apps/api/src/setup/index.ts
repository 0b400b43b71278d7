export { SetupModule } from './setup.module';
export { SetupCode } from './setup-code';
