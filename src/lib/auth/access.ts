import { ROUTES } from './routes';
import type { Access, RouteRule } from './routes';

/** Who is asking, as the middleware resolved it (see App.Locals). */
export interface Viewer {
  user: App.Locals['user'];
  organisation: App.Locals['organisation'];
  role: App.Locals['role'];
}

/** The middleware's answer: let the request through, or refuse it as signed out or not allowed. */
export type Decision = 'allow' | 'unauthorised' | 'forbidden';

interface Parsed {
  rule: RouteRule;
  segments: string[];
  wildcard: boolean;
}

const PARSED: Parsed[] = ROUTES.map((rule) => {
  const segments = split(rule.pattern);
  const wildcard = segments.at(-1) === '**';
  return { rule, segments: wildcard ? segments.slice(0, -1) : segments, wildcard };
});

function split(path: string): string[] {
  return path.split('/').filter(Boolean);
}

function segmentMatches(pattern: string, actual: string): boolean {
  return /^\[[^\]]+\]$/.test(pattern) || pattern === actual;
}

/** Rank of a matching pattern: any exact match beats any wildcard; then more literal segments. */
function score(p: Parsed, path: string[]): number {
  if (p.wildcard ? path.length < p.segments.length : path.length !== p.segments.length) return -1;
  if (!p.segments.every((s, i) => segmentMatches(s, path[i]))) return -1;
  const literals = p.segments.filter((s) => !s.startsWith('[')).length;
  return (p.wildcard ? 0 : 10_000) + p.segments.length * 100 + literals;
}

/** The table entry that governs a path (the most specific match; '/**' always matches). */
export function ruleFor(pathname: string): RouteRule {
  const path = split(pathname.replace(/\.html$/, '').replace(/\/index$/, ''));
  let best: Parsed = PARSED[0];
  let bestScore = -1;
  for (const p of PARSED) {
    const s = score(p, path);
    if (s > bestScore) {
      best = p;
      bestScore = s;
    }
  }
  return best.rule;
}

/** Whether a viewer may use a route of the given access level. */
export function decide(access: Access, viewer: Viewer): Decision {
  if (access === 'anyone') return 'allow';
  const { user } = viewer;
  if (!user) return 'unauthorised';
  switch (access) {
    case 'signed_in':
      return 'allow';
    case 'member':
      return viewer.organisation && viewer.role ? 'allow' : 'forbidden';
    case 'owner':
      return viewer.organisation && viewer.role === 'owner' ? 'allow' : 'forbidden';
    case 'support':
      return user.staffRole === 'support' || user.staffRole === 'admin' ? 'allow' : 'forbidden';
    case 'admin':
      return user.staffRole === 'admin' ? 'allow' : 'forbidden';
  }
}

/** True when the route needs to know who is visiting (so the session is looked up). */
export function needsViewer(rule: RouteRule): boolean {
  return rule.access !== 'anyone' || rule.session === 'optional';
}

/** True for API paths, which answer JSON instead of redirecting. */
export function isApiPath(pathname: string): boolean {
  return pathname === '/api' || pathname.startsWith('/api/');
}
