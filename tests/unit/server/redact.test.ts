import { afterEach, describe, expect, test } from 'vitest';
import { logPath, scrub } from '../../../src/lib/server/redact';

describe('scrub', () => {
  const saved = process.env.AUTH_SECRET;
  afterEach(() => {
    if (saved === undefined) delete process.env.AUTH_SECRET;
    else process.env.AUTH_SECRET = saved;
  });

  test('does remove the token and address from a sign-in link', () => {
    const text =
      'link http://x.test/api/auth/callback/resend?callbackUrl=%2Fapp&token=9f8e7d6c&email=a%40b.test';
    const out = scrub(text);
    expect(out).not.toMatch(/9f8e7d6c|a%40b\.test/);
    expect(out).toContain('callbackUrl=%2Fapp');
  });

  test('does remove bearer tokens and key-shaped strings', () => {
    const out = scrub(
      'Authorization: Bearer abc.def-123 key sk_live_51Habc whsec_q1w2e3 re_12345678abcd',
    );
    expect(out).not.toMatch(/abc\.def-123|sk_live_51Habc|whsec_q1w2e3|re_12345678abcd/);
  });

  test('does remove the configured AUTH_SECRET wherever it appears', () => {
    process.env.AUTH_SECRET = 'a-long-configured-secret-value';
    expect(scrub('oops a-long-configured-secret-value leaked')).toBe('oops [redacted] leaked');
  });
});

describe('scrub in free text', () => {
  test('does remove a credential written as name=value outside a URL', () => {
    expect(scrub('failed with token=abc123, retrying')).toBe(
      'failed with token=[redacted], retrying',
    );
  });
});

describe('logPath', () => {
  test('does drop the query string entirely', () => {
    expect(logPath('/api/auth/callback/resend?token=abc&email=x')).toBe(
      '/api/auth/callback/resend',
    );
  });

  test('does mask capability tokens in share, invite and flag links only', () => {
    expect(logPath('/r/Zk3x9q/report.pdf')).toBe('/r/[token]/report.pdf');
    expect(logPath('/invite/abc123')).toBe('/invite/[token]');
    expect(logPath('/flags/abc123')).toBe('/flags/[token]');
    expect(logPath('/app/flags/42')).toBe('/app/flags/42');
  });

  test('does cap the length at 200 characters', () => {
    expect(logPath(`/${'a'.repeat(500)}`)).toHaveLength(200);
  });
});
