/** A person as other records show them: id and display name, never the e-mail or roles. */
export interface UserRef {
  id: string;
  displayName: string;
}

/** One page of a long list; `page` counts from 1. */
export interface Page<Item> {
  items: Item[];
  total: number;
  page: number;
  pageSize: number;
}

/** One problem the API found with a request field: which field, why, and the allowed range. */
export interface ApiIssue {
  field: string;
  reason: string;
  /** The value that was refused, where echoing it helps. */
  value?: unknown;
  range?: { min?: number; max?: number; unit: string };
}

/**
 * Every 4xx and 5xx answer of the API: a message a person can read, the field it is about, and
 * the issues one by one. Some answers add data (a save conflict carries both versions).
 */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  field?: string;
  issues?: ApiIssue[];
  [extra: string]: unknown;
}
