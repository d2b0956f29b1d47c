import axios, { AxiosError } from 'axios';
import type { ApiErrorBody, ApiIssue } from '@loftwright/contract';
import { getToken, setToken } from './session';

export type { ApiIssue } from '@loftwright/contract';

/** An API failure as the UI shows it: status, message and, where the API names one, the field. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    message: string,
    readonly field?: string,
    readonly issues: ApiIssue[] = [],
    /** The whole error body, for answers that carry data (a 409 holds both versions). */
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

/** What a failed request's body may hold; a proxy in front may answer with anything. */
type ErrorBody = Partial<Pick<ApiErrorBody, 'field' | 'issues'>> & {
  message?: string | string[];
};

function toApiError(error: unknown): ApiError {
  if (error instanceof AxiosError) {
    const status = error.response?.status ?? 0;
    const body = error.response?.data as ErrorBody | undefined;
    const message = Array.isArray(body?.message) ? body.message.join('; ') : body?.message;
    if (status === 0) return new ApiError(0, 'The Loftwright server could not be reached.');
    return new ApiError(
      status,
      message ?? error.message,
      body?.field,
      body?.issues ?? [],
      (body ?? {}) as Record<string, unknown>,
    );
  }
  return new ApiError(0, error instanceof Error ? error.message : String(error));
}

/** The one HTTP client of the web app. Every call goes to the same origin under /api. */
export const apiClient = axios.create({
  baseURL: '/api',
  headers: { Accept: 'application/json' },
  timeout: 30000,
});

apiClient.interceptors.request.use((config) => {
  const token = getToken();
  if (token) config.headers.set('Authorization', `Bearer ${token}`);
  return config;
});

/** A download's error answer arrives as a Blob; its JSON body holds the message to show. */
async function readBlobBody(error: unknown): Promise<void> {
  const response = error instanceof AxiosError ? error.response : undefined;
  if (!response || !(response.data instanceof Blob)) return;
  try {
    response.data = JSON.parse(await response.data.text()) as unknown;
  } catch {
    // Not JSON (a proxy's page): the status line says enough.
    response.data = undefined;
  }
}

apiClient.interceptors.response.use(
  (response) => response,
  async (error: unknown) => {
    await readBlobBody(error);
    const apiError = toApiError(error);
    // An expired or revoked token: drop it, and the app shows the sign-in page.
    if (apiError.status === 401 && getToken()) setToken(null);
    return Promise.reject(apiError);
  },
);
