export { sessionHasExpired, sessionKey, sessionQuery, useSession, useLogout } from './api/session';
export { useCan } from './api/access';
export { ChangePasswordForm } from './components/change-password-form';
export { SignInForm } from './components/sign-in-form';
export { SetupForm } from './components/setup-form';
export { ChoosePasswordForm } from './components/choose-password-form';
export { ForgotPasswordForm } from './components/forgot-password-form';
export { RecoveryCodesCard } from './components/recovery-codes';
export { TotpSetup } from './components/totp-setup';
export { CodeInput } from './components/code-input';
export {
  setupStatusQuery,
  invitationPreviewQuery,
  tokenFromHash,
  useAcceptInvitation,
  useConfirmSignup,
  useResetPassword,
  useTwoFactor,
  useStartTwoFactor,
  useConfirmTwoFactor,
  useDisableTwoFactor,
  useRequireTwoFactor,
} from './api/accounts';
export { TwoFactorCard } from './components/two-factor-card';
export { RequireTwoFactorCard } from './components/require-two-factor';
