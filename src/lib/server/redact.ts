/**
 * Scrubbing for anything that reaches a log line: secrets configured in the environment,
 * bearer tokens, key-shaped strings, and query parameters that carry a credential (the sign-in
 * link's token, an e-mail address beside it). Applied to free text such as error messages.
 */

/** Environment settings whose values must never appear in a log. */
const SECRET_ENV = [
  'AUTH_SECRET',
  'STRIPE_SECRET_KEY',
  'STRIPE_WEBHOOK_SECRET',
  'RESEND_API_KEY',
] as const;

const CREDENTIAL_PARAM =
  /(^|[?&;\s,(])((?:token|code|secret|key|signature|password|email|csrfToken)=)[^&#\s"',)]*/gi;
const BEARER = /\b(Bearer|Basic)\s+[\w~+/.=-]+/gi;
const KEY_SHAPED = /\b(sk|rk|pk)_(live|test)_[\w]+|\bwhsec_[\w]+|\bre_[\w]{8,}/g;

export const REDACTED = '[redacted]';

function configuredSecrets(): string[] {
  return SECRET_ENV.map((name) => process.env[name] ?? '').filter((value) => value.length >= 8);
}

/** `text` with every credential we can recognise replaced by [redacted]. */
export function scrub(text: string): string {
  let out = text
    .replace(CREDENTIAL_PARAM, `$1$2${REDACTED}`)
    .replace(BEARER, `$1 ${REDACTED}`)
    .replace(KEY_SHAPED, REDACTED);
  for (const secret of configuredSecrets()) out = out.split(secret).join(REDACTED);
  return out;
}

/** Segments of paths that are themselves capabilities (share links, invites, flag threads). */
const CAPABILITY_PATH = /^\/(r|flags|invite)\/[^/]+/;

/**
 * The path as logged: no query string at all (sign-in callbacks carry their token there), no
 * capability token in the path, and at most 200 characters.
 */
export function logPath(url: string | undefined): string {
  const raw = (url ?? '/').split(/[?#]/, 1)[0] || '/';
  return raw.replace(CAPABILITY_PATH, '/$1/[token]').slice(0, 200);
}
