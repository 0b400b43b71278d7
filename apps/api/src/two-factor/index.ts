export { TwoFactorModule } from './two-factor.module';
export { TwoFactorService, type SecondFactorNeed } from './two-factor.service';
