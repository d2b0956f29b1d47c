import { useSyncExternalStore } from 'react';

/**
 * The signed-in session: the access token, kept in localStorage so a reload keeps the user
 * signed in. Other modules subscribe to hear about sign-in and sign-out.
 */
const STORAGE_KEY = 'loftwright.session';

type Listener = (token: string | null) => void;
const listeners = new Set<Listener>();

export function getToken(): string | null {
  try {
    return window.localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

export function setToken(token: string | null): void {
  if (token) window.localStorage.setItem(STORAGE_KEY, token);
  else window.localStorage.removeItem(STORAGE_KEY);
  for (const listener of listeners) listener(token);
}

export function onTokenChange(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The current token, re-rendering when it changes (sign-in, sign-out, an expired session). */
export function useToken(): string | null {
  return useSyncExternalStore(
    (notify) => onTokenChange(() => notify()),
    getToken,
    () => null,
  );
}
