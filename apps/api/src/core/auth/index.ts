export { Public, Can, CurrentUser, CurrentActor, OwnerLink } from './auth.decorators';
export type { AuthUser, Role, SessionClaims } from './auth-user';
export { AuthCoreModule } from './auth-core.module';
export { PolicyGuard, assertCan, checkRoutePolicy, staffActor } from './policy.guard';
export { CSRF, issueCsrfToken } from './csrf';
export { SESSION_COOKIE, CSRF_COOKIE, CSRF_HEADER, sessionCookieOptions } from './session-cookie';
export { SessionStore } from './session-store';
export { sessionTokenFrom } from './jwt.strategy';
export { newLinkToken, hashLinkToken } from './link-token';
