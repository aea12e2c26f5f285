/** Password rules, shared by the browser form and the server (no hashing here). */
export const PASSWORD_MIN_LENGTH = 10;
