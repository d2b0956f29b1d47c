import type {
  CalculationDetail,
  CalculationListItem,
  ClassDetail,
  ClassSummary,
  CreateClassBody,
  ExampleDetail,
  ExampleSettings,
  ExampleSummary,
  PublishExampleBody,
  Submission,
} from '@loftwright/contract';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type {
  ClassDetail,
  ClassSummary,
  ExampleDetail,
  ExampleSettings,
  ExampleStep,
  ExampleSummary,
  ExerciseSettings,
  Question,
  RevealRule,
  Submission,
  TryRanges,
} from '@loftwright/contract';

const classesKey = ['classes'] as const;

export const useClasses = () =>
  useQuery({
    queryKey: classesKey,
    queryFn: async () => (await apiClient.get<ClassSummary[]>('/classes')).data,
  });

export const useClass = (id: string) =>
  useQuery({
    queryKey: [...classesKey, id],
    queryFn: async () => (await apiClient.get<ClassDetail>(`/classes/${id}`)).data,
  });

export const useClassExamples = (id: string) =>
  useQuery({
    queryKey: [...classesKey, id, 'examples'],
    queryFn: async () => (await apiClient.get<ExampleSummary[]>(`/classes/${id}/examples`)).data,
  });

/** Every change to a class or its examples refreshes what is shown of classes. */
function useClassMutation<Variables, Result>(
  run: (variables: Variables) => Promise<Result>,
  extraKeys: readonly (readonly unknown[])[] = [],
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: classesKey });
      for (const key of extraKeys) await queryClient.invalidateQueries({ queryKey: key });
    },
  });
}

export const useCreateClass = () =>
  useClassMutation(
    async (body: CreateClassBody) => (await apiClient.post<ClassDetail>('/classes', body)).data,
  );

export const useJoinClass = () =>
  useClassMutation(
    async (code: string) => (await apiClient.post<ClassDetail>('/classes/join', { code })).data,
  );

export const useRenewJoinCode = (id: string) =>
  useClassMutation(
    async (joinCodeValidDays: number) =>
      (await apiClient.post<ClassDetail>(`/classes/${id}/join-code`, { joinCodeValidDays })).data,
  );

export const useCloseClass = (id: string) =>
  useClassMutation(async () => (await apiClient.post<ClassDetail>(`/classes/${id}/close`)).data);

export const useRemoveStudent = (id: string) =>
  useClassMutation(async (studentId: string) => {
    await apiClient.delete(`/classes/${id}/students/${studentId}`);
  });

export const usePublishExample = (classId: string) =>
  useClassMutation(
    async (body: PublishExampleBody) =>
      (await apiClient.post<ExampleDetail>(`/classes/${classId}/examples`, body)).data,
  );

const exampleKey = (id: string) => ['examples', id] as const;

export const useExample = (id: string) =>
  useQuery({
    queryKey: exampleKey(id),
    queryFn: async () => (await apiClient.get<ExampleDetail>(`/examples/${id}`)).data,
  });

export const useUpdateExample = (id: string) =>
  useClassMutation(
    async (body: ExampleSettings) =>
      (await apiClient.patch<ExampleDetail>(`/examples/${id}`, body)).data,
    [exampleKey(id)],
  );

export const useRemoveExample = () =>
  useClassMutation(async (id: string) => {
    await apiClient.delete(`/examples/${id}`);
  });

export const useSubmissions = (exampleId: string, enabled = true) =>
  useQuery({
    queryKey: [...exampleKey(exampleId), 'submissions'],
    queryFn: async () =>
      (await apiClient.get<Submission[]>(`/examples/${exampleId}/submissions`)).data,
    enabled,
  });

export const useSubmitAnswers = (exampleId: string) =>
  useClassMutation(
    async (answers: Record<string, number | null>) =>
      (await apiClient.post<Submission>(`/examples/${exampleId}/submissions`, { answers })).data,
    [exampleKey(exampleId)],
  );

/** What a teacher may publish: their own calculations, and others' approved versions. */
export const usePublishableCalculations = () =>
  useQuery({
    queryKey: ['calculations', 'publishable'],
    queryFn: async () =>
      (
        await apiClient.get<{ items: CalculationListItem[] }>('/calculations', {
          params: { pageSize: 100, sort: '-updatedAt' },
        })
      ).data.items,
  });

/** The versions a teacher may choose from. */
export const useVersionChoices = (calculationId: string | undefined) =>
  useQuery({
    queryKey: ['calculations', calculationId, 'versions-for-publishing'],
    queryFn: async () =>
      (await apiClient.get<CalculationDetail>(`/calculations/${calculationId}`)).data,
    enabled: calculationId !== undefined,
  });
