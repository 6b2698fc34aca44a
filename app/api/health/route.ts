import { NextResponse } from 'next/server';
import { getSequelize } from '@/app/lib/server/db';

export const dynamic = 'force-dynamic';

/** Reports whether the database answers; used by the test runner and Playwright's webServer. */
export async function GET() {
  try {
    await getSequelize().authenticate();
    return NextResponse.json({ status: 'ok', database: 'up' }, { headers: { 'cache-control': 'no-store' } });
  } catch (error) {
    console.error('[health] database check failed:', (error as Error).message);
    return NextResponse.json({ status: 'degraded', database: 'down' }, { status: 503, headers: { 'cache-control': 'no-store' } });
  }
}
