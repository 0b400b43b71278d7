export { AuthModule } from './auth.module';
