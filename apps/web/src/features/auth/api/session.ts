import type { ChangePasswordRequest, LoginRequest, LoginResponse, SessionResponse, SignInStep } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, ApiError, setCsrfToken } from '../../../lib/api-client';
import { forgetCache } from '../../../lib/offline-cache';

export const sessionKey = ['session'] as const;

let expired = false;
/** True when the last session probe found a session that had expired (not merely absent). */
export const sessionHasExpired = (): boolean => expired;

/** The signed-in user, or null. The CSRF token travels with it. */
export const sessionQuery = queryOptions({
  queryKey: sessionKey,
  staleTime: 5 * 60_000,
  queryFn: async () => {
    try {
      const res = await api<SessionResponse>('/auth/session', { quietAuth: true });
      setCsrfToken(res.csrfToken);
      expired = false;
      return res.user;
    } catch (e) {
      expired = e instanceof ApiError && e.code === 'SESSION_EXPIRED';
      if (e instanceof ApiError && e.status === 401) return null;
      throw e;
    }
  },
});

export const useSession = () => useQuery(sessionQuery);

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: LoginRequest) => api<SignInStep>('/auth/login', { method: 'POST', body, quietAuth: true }),
    onSuccess: (res) => {
      // With a second factor the password only earns a challenge; SecondStep finishes the sign-in.
      if (res.step !== 'done') return;
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(sessionKey, res.user);
    },
  });
}

export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/auth/logout', { method: 'POST', quietAuth: true }),
    onSettled: () => {
      setCsrfToken(null);
      // The kept answers leave the phone with the user; the next person signing in never sees them.
      void forgetCache();
      qc.clear();
      qc.setQueryData(sessionKey, null);
    },
  });
}

/**
 * The signed-in user's own password. The API ends every session of theirs and
 * opens a fresh one here, so the new CSRF token must replace the old one.
 * quietAuth: a wrong current password answers 401 and must not sign this device out.
 */
export function useChangePassword() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ChangePasswordRequest) => api<LoginResponse>('/auth/password', { method: 'POST', body, quietAuth: true }),
    onSuccess: (res) => {
      setCsrfToken(res.csrfToken);
      qc.setQueryData(sessionKey, res.user);
    },
  });
}
