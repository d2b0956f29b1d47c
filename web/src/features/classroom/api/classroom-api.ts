import type {
  AnswerCheck,
  CalculationWarning,
  DataSeries,
  DerivationStep,
  ExerciseCheck,
  OutputQuantity,
} from '@loftwright/buoyancy';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

/** A class as the API shows it (api/src/classrooms/classrooms.service.ts). */
export interface ClassSummary {
  id: string;
  title: string;
  teacherId: string;
  closed: boolean;
  closedAt: string | null;
  createdAt: string;
  standing: 'teacher' | 'student' | 'admin';
  studentCount: number;
  /** Only for the teacher (and admins). */
  joinCode?: string;
  joinUrl?: string;
  joinCodeExpiresAt?: string;
}

export interface ClassDetail extends ClassSummary {
  teacher: { id: string; displayName: string };
  students?: { id: string; displayName: string; joinedAt: string }[];
}

/** When a student who has answered sees the engine's values (a closed class shows them always). */
export type RevealRule = 'after-correct' | 'after-attempts' | 'when-closed';

export interface ExerciseSettings {
  hiddenOutputs: string[];
  tolerancePercent: number;
  reveal?: RevealRule;
  revealAfterAttempts?: number;
}

export type TryRanges = Record<string, { min: number; max: number }>;

export interface ExampleSummary {
  id: string;
  classroomId: string;
  title: string;
  kind: string;
  calculationId: string;
  versionNumber: number;
  fingerprint: string;
  isExercise: boolean;
  tolerancePercent: number | null;
  publishedAt: string;
  updatedAt: string;
  myAttempts?: number;
  myLatestAllCorrect?: boolean | null;
}

/** A step as the class sees it; in an exercise not yet answered, hidden numbers are null. */
export interface ExampleStep extends Omit<DerivationStep, 'result' | 'values'> {
  result: Omit<DerivationStep['result'], 'value'> & { value: number | null };
  values: readonly (Omit<DerivationStep['values'][number], 'value'> & { value: number | null })[];
  hidden: boolean;
}

export interface Question {
  output: string;
  label: string;
  unit: string;
  stepId: string;
}

export interface Submission {
  id: string;
  exampleId: string;
  student: { id: string; displayName: string };
  attempt: number;
  answers: Record<string, number | null>;
  check: ExerciseCheck & {
    tolerancePercent: number;
    /** The engine's value and the error are null until the answers are revealed to the student. */
    answers: (Omit<AnswerCheck, 'expected' | 'relativeError'> & {
      expected: number | null;
      relativeError: number | null;
    })[];
  };
  correctCount: number;
  answerCount: number;
  allCorrect: boolean;
  submittedAt: string;
}

export interface ExampleDetail extends ExampleSummary {
  classroomTitle: string;
  classroomClosed: boolean;
  teacher: { id: string; displayName: string };
  intro: string;
  engineVersion: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, OutputQuantity>;
  steps: ExampleStep[];
  warnings: CalculationWarning[];
  series: Record<string, DataSeries> | null;
  stepNotes: Record<string, string>;
  tryRanges: TryRanges;
  chartStepId: string | null;
  exercise: ExerciseSettings | null;
  standing: 'teacher' | 'student' | 'admin';
  /** False while a student has not yet answered the exercise. */
  revealed: boolean;
  questions: Question[];
  mySubmissions: Submission[];
}

export interface ExampleSettings {
  title?: string;
  intro?: string;
  stepNotes?: Record<string, string>;
  tryRanges?: TryRanges;
  chartStepId?: string | null;
  exercise?: ExerciseSettings | null;
}

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
    async (body: { title: string; joinCodeValidDays?: number }) =>
      (await apiClient.post<ClassDetail>('/classes', body)).data,
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
    async (body: ExampleSettings & { calculationId: string; versionNumber: number }) =>
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
export interface PublishableCalculation {
  id: string;
  title: string;
  kind: string;
  owner: { id: string; displayName: string } | null;
  latestVersion: number;
  status: string;
}

export const usePublishableCalculations = () =>
  useQuery({
    queryKey: ['calculations', 'publishable'],
    queryFn: async () =>
      (
        await apiClient.get<{ items: PublishableCalculation[] }>('/calculations', {
          params: { pageSize: 100, sort: '-updatedAt' },
        })
      ).data.items,
  });

export interface VersionChoice {
  number: number;
  status: string;
  note: string;
}

export const useVersionChoices = (calculationId: string | undefined) =>
  useQuery({
    queryKey: ['calculations', calculationId, 'versions-for-publishing'],
    queryFn: async () =>
      (
        await apiClient.get<{ versions: VersionChoice[]; owner: { id: string } | null }>(
          `/calculations/${calculationId}`,
        )
      ).data,
    enabled: calculationId !== undefined,
  });
