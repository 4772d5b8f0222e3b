/**
 * Password length limits, shared by the server (better-auth, sign-up and invitation checks) and
 * the browser forms. No imports, so a client form can use them without pulling in better-auth.
 */

/** Shortest password Knotwork accepts. */
export const MIN_PASSWORD_LENGTH = 8;
/** Longest password Knotwork accepts. */
export const MAX_PASSWORD_LENGTH = 128;
