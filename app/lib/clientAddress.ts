/**
 * The client's address for rate limits and the audit log. Behind a trusted proxy
 * (KETBOOK_TRUST_PROXY=1) it is the first entry of X-Forwarded-For; otherwise Next's
 * route handlers do not expose the socket address, so every request counts as "local".
 */
export function clientAddressFrom(headers: Headers, trustProxy: boolean): string {
  if (trustProxy) {
    const forwarded = headers.get('x-forwarded-for');
    const first = forwarded?.split(',')[0]?.trim();
    if (first) return first.slice(0, 64);
  }
  return 'local';
}
