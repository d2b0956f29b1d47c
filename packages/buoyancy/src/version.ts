/**
 * Version of the calculation engine. Bump it whenever any result for the same inputs can change:
 * stored versions record it, and the API compares it when it re-verifies an approved result.
 */
export const ENGINE_VERSION = '0.1.0';
