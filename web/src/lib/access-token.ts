/** Where the signed-in session's JWT lives between visits. */
export const ACCESS_TOKEN_STORAGE_KEY = 'homeground.accessToken';

/**
 * Reads the stored token. Storage can throw (Safari private mode, blocked cookies): then the
 * person is simply signed out rather than shown a broken page.
 */
export function readAccessToken(): string | null {
  try {
    return window.localStorage.getItem(ACCESS_TOKEN_STORAGE_KEY);
  } catch {
    return null;
  }
}

export function writeAccessToken(token: string): void {
  try {
    window.localStorage.setItem(ACCESS_TOKEN_STORAGE_KEY, token);
  } catch {
    // Without storage the session lasts until the tab closes; the in-memory state still works.
  }
}

export function clearAccessToken(): void {
  try {
    window.localStorage.removeItem(ACCESS_TOKEN_STORAGE_KEY);
  } catch {
    // Nothing stored, nothing to clear.
  }
}
