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

/** GET /api/admin/audit items (api/src/audit/audit.service.ts, AuditView). */
export interface AuditRow {
  id: number;
  createdAt: string;
  action: string;
  actor: { id: string; displayName: string } | null;
  /** The entry as a sentence, with names and titles. */
  summary: string;
  changes: { label: string; from: string | null; to: string | null }[];
  targetType: string;
  targetId: string | null;
}

export interface AuditFilters {
  page: number;
  pageSize: number;
  action?: string;
  actorId?: string;
  /** ISO 8601 times, both ends included. */
  from?: string;
  to?: string;
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

export const useAuditActions = () =>
  useQuery({
    queryKey: ['admin', 'audit', 'actions'],
    queryFn: async () =>
      (await apiClient.get<{ action: string; words: string }[]>('/admin/audit/actions')).data,
    staleTime: Infinity,
  });

export const useAudit = (params: AuditFilters) =>
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
