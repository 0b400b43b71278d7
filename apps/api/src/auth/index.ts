export { AuthModule } from './auth.module';
export { AuthService, type SignInOutcome } from './auth.service';
export { SessionResponder, clientAddress } from './session-responder';
