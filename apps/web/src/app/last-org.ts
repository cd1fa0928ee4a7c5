const KEY = 'porestack.lastOrganisation';

/** Remembers the organisation last opened, so "/" returns the person to it. */
export function rememberOrg(orgId: string): void {
  try {
    localStorage.setItem(KEY, orgId);
  } catch {
    // Storage can be off (private mode); the first membership is a fine default then.
  }
}

export function lastOrg(): string | null {
  try {
    return localStorage.getItem(KEY);
  } catch {
    return null;
  }
}
