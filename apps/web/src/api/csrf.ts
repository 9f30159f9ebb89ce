/**
 * The session's CSRF token, learnt from GET /api/v1/me. Every write made with the session cookie sends it
 * back in X-CSRF-Token; the server refuses cookie writes without it.
 */
let token: string | null = null;

export const setCsrfToken = (value: string | null) => {
  token = value;
};

export const csrfHeaders = (): Record<string, string> => (token ? { 'x-csrf-token': token } : {});
