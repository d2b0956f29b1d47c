import { randomInt } from 'node:crypto';

/**
 * Letters and digits a class can read off a projector and type without confusion: no 0 or O, no
 * 1, I or L, so no pair of characters in a code looks alike.
 */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 8;

/** A new random join code (31⁸ ≈ 8.5 × 10¹¹ possibilities). */
export function newJoinCode(): string {
  let code = '';
  for (let i = 0; i < JOIN_CODE_LENGTH; i += 1) {
    code += JOIN_CODE_ALPHABET[randomInt(JOIN_CODE_ALPHABET.length)];
  }
  return code;
}

/** A code as a student may type it (lower case, spaced, with the hyphen shown), as stored. */
export const normaliseJoinCode = (text: string): string => text.toUpperCase().replace(/[\s-]/g, '');

/** "ABCD-EFGH": the code as shown to people. */
export const formatJoinCode = (code: string): string => `${code.slice(0, 4)}-${code.slice(4)}`;
