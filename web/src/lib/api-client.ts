import axios, { AxiosError } from 'axios';

/** An API failure as the UI shows it: status, message and, where the API names one, the field. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    message: string,
    readonly field?: string,
  ) {
    super(message);
  }
}

interface ErrorBody {
  message?: string | string[];
  field?: string;
}

function toApiError(error: unknown): ApiError {
  if (error instanceof AxiosError) {
    const status = error.response?.status ?? 0;
    const body = error.response?.data as ErrorBody | undefined;
    const message = Array.isArray(body?.message) ? body.message.join('; ') : body?.message;
    if (status === 0) return new ApiError(0, 'The Loftwright server could not be reached.');
    return new ApiError(status, message ?? error.message, body?.field);
  }
  return new ApiError(0, error instanceof Error ? error.message : String(error));
}

/** The one HTTP client of the web app. Every call goes to the same origin under /api. */
export const apiClient = axios.create({
  baseURL: '/api',
  headers: { Accept: 'application/json' },
  timeout: 30000,
});

apiClient.interceptors.response.use(
  (response) => response,
  (error: unknown) => Promise.reject(toApiError(error)),
);
