/** Every API route lives under this prefix; every other path belongs to the web app. */
export const API_PREFIX = 'api';
