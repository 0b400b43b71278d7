export { sessionHasExpired, sessionKey, sessionQuery, useSession, useLogout } from './api/session';
export { useCan } from './api/access';
export { ChangePasswordForm } from './components/change-password-form';
export { SignInForm } from './components/sign-in-form';
