/** Injection token of the key that signs access tokens. */
export const JWT_SECRET = Symbol('JWT_SECRET');
