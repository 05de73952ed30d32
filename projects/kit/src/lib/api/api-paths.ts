/** Same origin as the console: the gateway serves both. */
export const API_BASE = '/api/v1';

export function isApiUrl(url: string): boolean {
  return url.startsWith('/api/');
}

/** Sign-in and refresh carry no bearer token and are never retried after a refresh. */
export function isAuthUrl(url: string): boolean {
  return url.startsWith(`${API_BASE}/auth/login`) || url.startsWith(`${API_BASE}/auth/refresh`);
}
