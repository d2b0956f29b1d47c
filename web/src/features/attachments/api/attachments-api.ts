import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Attachment } from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

export type { Attachment } from '@loftwright/contract';

const listKey = (calculationId: string) => ['attachments', calculationId];

export const useAttachments = (calculationId: string) =>
  useQuery({
    queryKey: listKey(calculationId),
    queryFn: async () =>
      (await apiClient.get<Attachment[]>(`/calculations/${calculationId}/attachments`)).data,
  });

export function useUploadAttachment(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      file,
      fillLogId,
      onProgress,
    }: {
      file: File;
      fillLogId?: string;
      onProgress?: (percent: number) => void;
    }) => {
      const form = new FormData();
      form.append('file', file);
      if (fillLogId) form.append('fillLogId', fillLogId);
      return (
        await apiClient.post<Attachment>(`/calculations/${calculationId}/attachments`, form, {
          // A 20 MB photo on a field connection takes longer than an ordinary request.
          timeout: 10 * 60_000,
          onUploadProgress: (event) => {
            if (event.total) onProgress?.(Math.round((100 * event.loaded) / event.total));
          },
        })
      ).data;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listKey(calculationId) }),
  });
}

export function useRemoveAttachment(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      await apiClient.delete(`/attachments/${id}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listKey(calculationId) }),
  });
}

/**
 * The file's bytes, fetched with the session's token (an <img src> or a new tab could not send
 * it), as a Blob of the type the server found in the content.
 */
export async function fetchAttachmentBlob(attachment: Attachment): Promise<Blob> {
  const path = attachment.contentUrl.replace(/^\/api/, '');
  const response = await apiClient.get<Blob>(path, { responseType: 'blob' });
  return new Blob([response.data], { type: attachment.mediaType });
}

export const useAttachmentBlob = (attachment: Attachment, enabled: boolean) =>
  useQuery({
    queryKey: ['attachments', 'content', attachment.id],
    queryFn: () => fetchAttachmentBlob(attachment),
    enabled,
    staleTime: Number.POSITIVE_INFINITY,
  });
