import 'server-only';
import type { AppConfig } from '../appConfig';
import { recentFailures } from '../queries/signInAttempts';
import { retryAfterSeconds } from '../rateLimit';

/** Seconds to wait before another sign-in for this account or address, or null when allowed. */
export async function rateLimitRetryAfter({
  email,
  clientAddress,
  config,
}: {
  email: string;
  clientAddress: string;
  config: Pick<AppConfig, 'signInMaxAttempts' | 'signInWindowSeconds'>;
}): Promise<number | null> {
  const now = new Date();
  const since = new Date(now.getTime() - config.signInWindowSeconds * 1000);
  const { byEmail, byAddress } = await recentFailures({ email, clientAddress, since });
  const limits = [byEmail, byAddress].map((failureTimes) =>
    retryAfterSeconds({ failureTimes, max: config.signInMaxAttempts, windowSeconds: config.signInWindowSeconds, now }),
  );
  const waits = limits.filter((s): s is number => s !== null);
  return waits.length ? Math.max(...waits) : null;
}
