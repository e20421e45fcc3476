import type { Href } from 'expo-router';

/**
 * Where to go after signing in: the link the person opened, only ever a path inside the app
 * ("/jobs/…"), never another site ("//evil.example", "https://…").
 */
export function safeNext(raw: string | string[] | undefined): Href {
  const next = Array.isArray(raw) ? raw[0] : raw;
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\') || next.startsWith('/sign-in')) return '/';
  return next as Href;
}

/** The sign-in screen with the path to come back to. */
export function signInHref(path: string): Href {
  return (path && path !== '/' ? `/sign-in?next=${encodeURIComponent(path)}` : '/sign-in') as Href;
}
