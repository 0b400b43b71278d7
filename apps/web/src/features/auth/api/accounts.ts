import type {
  AcceptInvitationRequest,
  InvitationPreview,
  RecoveryCodes,
  ResetPasswordRequest,
  SetupRequest,
  SetupStatus,
  SignInStep,
  SignupRequest,
  TotpEnrolment,
  TwoFactorStatus,
} from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '../../../lib/api-client';
import { sessionKey } from './session';

export const setupStatusQuery = queryOptions({ queryKey: ['setup-status'], queryFn: () => api<SetupStatus>('/setup', { quietAuth: true }), staleTime: 0 });

/** After any step that may sign in: keep the CSRF token and the user, as the sign-in form does. */
function useSignedInStep<B>(path: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: B) => api<SignInStep>(path, { method: 'POST', body, quietAuth: true }),
    onSuccess: (res) => {
      if (res.step !== 'done') return;
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(sessionKey, res.user);
    },
  });
}

export const useSetUp = () => useSignedInStep<SetupRequest>('/setup');
export const useAcceptInvitation = () => useSignedInStep<AcceptInvitationRequest>('/invitations/accept');
export const useResetPassword = () => useSignedInStep<ResetPasswordRequest>('/password-resets/use');
export const useConfirmSignup = () => useSignedInStep<{ token: string }>('/signup/confirm');

export const useSignUp = () =>
  useMutation({ mutationFn: (body: SignupRequest) => api<{ message: string }>('/signup', { method: 'POST', body, quietAuth: true }) });

export const useForgotPassword = () =>
  useMutation({ mutationFn: (email: string) => api<{ message: string }>('/password-resets', { method: 'POST', body: { email }, quietAuth: true }) });

export const invitationPreviewQuery = (token: string) =>
  queryOptions({
    queryKey: ['invitation-preview', token],
    queryFn: () => api<InvitationPreview>('/invitations/preview', { method: 'POST', body: { token }, quietAuth: true }),
    retry: false,
  });

export const twoFactorQuery = queryOptions({ queryKey: ['two-factor'], queryFn: () => api<TwoFactorStatus>('/account/two-factor') });
export const useTwoFactor = () => useQuery(twoFactorQuery);

export const useStartTwoFactor = () => useMutation({ mutationFn: () => api<TotpEnrolment>('/account/two-factor/start', { method: 'POST' }) });

export function useConfirmTwoFactor() {
  const qc = useQueryClient();
  return useMutation({
    // quietAuth: a wrong code answers 401 CODE_INVALID, which is a field problem and must not sign this device out.
    mutationFn: (code: string) => api<RecoveryCodes>('/account/two-factor/confirm', { method: 'POST', body: { code }, quietAuth: true }),
    onSuccess: () => qc.invalidateQueries({ queryKey: twoFactorQuery.queryKey }),
  });
}

export function useDisableTwoFactor() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (password: string) => api<void>('/account/two-factor/disable', { method: 'POST', body: { password }, quietAuth: true }),
    onSuccess: () => qc.invalidateQueries({ queryKey: twoFactorQuery.queryKey }),
  });
}

export function useRequireTwoFactor() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (required: boolean) => api<{ required: boolean; signedOut: number }>('/shop/two-factor', { method: 'PUT', body: { required } }),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: twoFactorQuery.queryKey }), qc.invalidateQueries({ queryKey: ['shop', 'settings'] })]),
  });
}

/** The secret from a link's #fragment (never sent to the server in a URL). */
export const tokenFromHash = (): string => decodeURIComponent(window.location.hash.replace(/^#/, ''));
