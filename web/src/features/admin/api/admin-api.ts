import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type Role = 'admin' | 'designer' | 'reviewer' | 'teacher' | 'student';
export const ROLES: Role[] = ['admin', 'designer', 'reviewer', 'teacher', 'student'];

export interface AdminUser {
  id: string;
  email: string;
  displayName: string;
  roles: Role[];
  createdAt: string;
}

export interface AuditRow {
  id: number;
  actorId: string | null;
  action: string;
  targetType: string;
  targetId: string | null;
  detail: Record<string, unknown> | null;
  createdAt: string;
}

export interface OutboxRow {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** Names, types and sizes of what was attached (the server keeps no bytes). */
  attachments: { filename: string; contentType: string; sizeBytes: number }[];
  receivedAt: string;
}

interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const useUsers = () =>
  useQuery({
    queryKey: ['admin', 'users'],
    queryFn: async () => (await apiClient.get<AdminUser[]>('/admin/users')).data,
  });

export function useUpdateRoles() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, roles }: { id: string; roles: Role[] }) =>
      (await apiClient.patch<AdminUser>(`/admin/users/${id}`, { roles })).data,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['admin', 'users'] }),
  });
}

export const useAudit = (params: { page: number; pageSize: number; action?: string }) =>
  useQuery({
    queryKey: ['admin', 'audit', params],
    queryFn: async () => (await apiClient.get<Page<AuditRow>>('/admin/audit', { params })).data,
    placeholderData: keepPreviousData,
  });

export const useOutbox = (params: { page: number; pageSize: number }) =>
  useQuery({
    queryKey: ['admin', 'outbox', params],
    queryFn: async () => (await apiClient.get<Page<OutboxRow>>('/admin/outbox', { params })).data,
    placeholderData: keepPreviousData,
  });
