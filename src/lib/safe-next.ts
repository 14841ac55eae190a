/**
 * Where to go after signing in. Only same-site paths are accepted so that a crafted link to
 * the sign-in page cannot send someone on to another site.
 */
export function safeNext(raw: string | null | undefined): string {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\')) return '/';
  if (raw === '/sign-in' || raw.startsWith('/sign-in?')) return '/';
  return raw;
}

export function signInPath(next?: string): string {
  const target = safeNext(next);
  return target === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(target)}`;
}
