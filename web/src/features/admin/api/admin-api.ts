import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AdminUser,
  AuditAction,
  AuditQuery,
  AuditRow,
  OutboxMessage,
  Page,
  Role,
  UpdateRolesBody,
} from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

export { ROLES } from '@loftwright/contract';
export type { AdminUser, AuditQuery, AuditRow, Role } from '@loftwright/contract';

export const useUsers = () =>
  useQuery({
    queryKey: ['admin', 'users'],
    queryFn: async () => (await apiClient.get<AdminUser[]>('/admin/users')).data,
  });

export function useUpdateRoles() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, roles }: { id: string; roles: Role[] }) =>
      (await apiClient.patch<AdminUser>(`/admin/users/${id}`, { roles } satisfies UpdateRolesBody))
        .data,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['admin', 'users'] }),
  });
}

export const useAuditActions = () =>
  useQuery({
    queryKey: ['admin', 'audit', 'actions'],
    queryFn: async () => (await apiClient.get<AuditAction[]>('/admin/audit/actions')).data,
    staleTime: Infinity,
  });

export const useAudit = (params: AuditQuery) =>
  useQuery({
    queryKey: ['admin', 'audit', params],
    queryFn: async () => (await apiClient.get<Page<AuditRow>>('/admin/audit', { params })).data,
    placeholderData: keepPreviousData,
  });

export const useOutbox = (params: { page: number; pageSize: number }) =>
  useQuery({
    queryKey: ['admin', 'outbox', params],
    queryFn: async () =>
      (await apiClient.get<Page<OutboxMessage>>('/admin/outbox', { params })).data,
    placeholderData: keepPreviousData,
  });
