import { describe, expect, it } from 'vitest';
import { redactUrl, tokenRoutePatterns } from './log-redaction.js';

const patterns = tokenRoutePatterns([
  '/api/customers/:id',
  '/api/auth/password-reset/:token',
  '/api/invitations/:token',
  '/api/invitations/:token/accept',
]);

describe('redactUrl', () => {
  it('replaces the :token segment of token routes, however short', () => {
    expect(redactUrl('/api/auth/password-reset/abc', patterns)).toBe(
      '/api/auth/password-reset/[redacted]',
    );
    expect(redactUrl('/api/invitations/tok/accept', patterns)).toBe(
      '/api/invitations/[redacted]/accept',
    );
    expect(redactUrl('/API/Invitations/tok/', patterns)).toBe('/API/Invitations/[redacted]/');
  });

  it('keeps ids and ordinary paths readable', () => {
    const id = '0b6f3f7e-8a9c-4d2e-9f10-1a2b3c4d5e6f';
    expect(redactUrl(`/api/customers/${id}`, patterns)).toBe(`/api/customers/${id}`);
    expect(redactUrl('/api/invitations', patterns)).toBe('/api/invitations');
    expect(redactUrl('/', patterns)).toBe('/');
  });

  it('replaces long random-looking segments on any route', () => {
    const token = 'Qm9ndXMtdG9rZW4tZm9yLXRlc3RzLW9ubHktMDEyMzQ1Njc';
    expect(redactUrl(`/api/nowhere/${token}/x`, patterns)).toBe('/api/nowhere/[redacted]/x');
  });

  it('replaces token, secret and password query values and keeps the rest', () => {
    expect(redactUrl('/api/x?token=abc&page=2&Reset_Token=q&password=p#frag', patterns)).toBe(
      '/api/x?token=[redacted]&page=2&Reset_Token=[redacted]&password=[redacted]',
    );
  });

  it('never throws on malformed escapes', () => {
    expect(redactUrl('/api/invitations/%E0%A4%A?token=%E0', patterns)).toBe(
      '/api/invitations/[redacted]?token=[redacted]',
    );
  });
});
