import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { NumberFormat } from '@loftwright/buoyancy';
import { setToken, useToken } from '@/lib/session';

export type Role = 'admin' | 'designer' | 'reviewer' | 'teacher' | 'student';

/** The account as GET /api/auth/me answers (api/src/users/user.entity.ts, PublicUser). */
export interface CurrentUser {
  id: string;
  email: string;
  displayName: string;
  roles: Role[];
  unitSystem: 'si' | 'us';
  /** How the person writes numbers: 1,234.5 (point-comma), 1 234,5 (comma-space), 1.234,5. */
  numberFormat: NumberFormat;
  /** ISO 4217 code, upper case: the default currency of new gas plans and prices. */
  currency: string;
}

/** The preferences PATCH /api/auth/me/preferences changes; send any of them. */
export type Preferences = Pick<CurrentUser, 'unitSystem' | 'numberFormat' | 'currency'>;

interface SignedIn {
  accessToken: string;
  user: CurrentUser;
}

/**
 * What POST /api/auth/register did (api/src/auth/auth.service.ts, RegisterOutcome): signed in
 * the first account of an empty database, or mailed the address a link to finish.
 */
export type RegisterOutcome =
  ({ status: 'signed-in' } & SignedIn) | { status: 'check-mail'; message: string };

export const getMe = async (): Promise<CurrentUser> =>
  (await apiClient.get<CurrentUser>('/auth/me')).data;

export const meQueryOptions = (signedIn: boolean) =>
  queryOptions({ queryKey: ['auth', 'me'], queryFn: getMe, staleTime: 60_000, enabled: signedIn });

/** The signed-in user, or undefined when nobody is signed in. */
export function useMe() {
  const token = useToken();
  const query = useQuery(meQueryOptions(token !== null));
  return { ...query, signedIn: token !== null, user: token ? query.data : undefined };
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { email: string; password: string }) =>
      (await apiClient.post<SignedIn>('/auth/login', body)).data,
    onSuccess: (data) => {
      setToken(data.accessToken);
      queryClient.setQueryData(['auth', 'me'], data.user);
    },
  });
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: {
      email: string;
      password: string;
      displayName: string;
      /** A class join code: the account becomes a student account in that class. */
      joinCode?: string;
      /** As guessed from the browser's locale (guessNumberFormat). */
      numberFormat?: NumberFormat;
    }) => (await apiClient.post<RegisterOutcome>('/auth/register', body)).data,
    onSuccess: (data) => {
      if (data.status !== 'signed-in') return;
      setToken(data.accessToken);
      queryClient.setQueryData(['auth', 'me'], data.user);
    },
  });
}

/** Opens the link mailed at registration: creates the account and signs it in. */
export function useConfirmRegistration() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (token: string) =>
      (await apiClient.post<SignedIn>('/auth/register/confirm', { token })).data,
    onSuccess: (data) => {
      setToken(data.accessToken);
      queryClient.setQueryData(['auth', 'me'], data.user);
    },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      await apiClient.post('/auth/logout').catch(() => undefined);
    },
    onSettled: () => {
      setToken(null);
      queryClient.clear();
    },
  });
}

export const useRequestReset = () =>
  useMutation({
    mutationFn: async (body: { email: string }) =>
      (await apiClient.post<{ message: string }>('/auth/password-reset/request', body)).data,
  });

export const useConfirmReset = () =>
  useMutation({
    mutationFn: async (body: { token: string; password: string }) =>
      apiClient.post('/auth/password-reset/confirm', body),
  });

export function useSetPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (changes: Partial<Preferences>) =>
      (await apiClient.patch<CurrentUser>('/auth/me/preferences', changes)).data,
    onSuccess: (user) => queryClient.setQueryData(['auth', 'me'], user),
  });
}
