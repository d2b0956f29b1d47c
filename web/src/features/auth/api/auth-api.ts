import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  Account,
  PasswordResetConfirmBody,
  PasswordResetRequestBody,
  Preferences,
  RegisterBody,
  RegisterOutcome,
  SignedIn,
  SignInBody,
} from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';
import { setToken, useToken } from '@/lib/session';

export type {
  Account,
  Preferences,
  RegisterBody,
  RegisterOutcome,
  Role,
} from '@loftwright/contract';

export const getMe = async (): Promise<Account> => (await apiClient.get<Account>('/auth/me')).data;

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
    mutationFn: async (body: SignInBody) =>
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
    mutationFn: async (body: RegisterBody) =>
      (await apiClient.post<RegisterOutcome>('/auth/register', body)).data,
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
    mutationFn: async (body: PasswordResetRequestBody) =>
      (await apiClient.post<{ message: string }>('/auth/password-reset/request', body)).data,
  });

export const useConfirmReset = () =>
  useMutation({
    mutationFn: async (body: PasswordResetConfirmBody) =>
      apiClient.post('/auth/password-reset/confirm', body),
  });

export function useSetPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (changes: Partial<Preferences>) =>
      (await apiClient.patch<Account>('/auth/me/preferences', changes)).data,
    onSuccess: (user) => queryClient.setQueryData(['auth', 'me'], user),
  });
}
