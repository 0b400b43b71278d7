export { sessionHasExpired, sessionKey, sessionQuery, useSession, useLogout } from './api/session';
export { SignInForm } from './components/sign-in-form';
