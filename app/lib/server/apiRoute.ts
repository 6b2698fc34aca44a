import 'server-only';
import { NextResponse } from 'next/server';
import { ApiError } from '../errors';

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler so every failure leaves as the shared error JSON. ApiErrors
 * carry their own status and message; anything else is logged and reported as a 500
 * without internals.
 */
export function apiRoute<C = unknown>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      const apiError = error instanceof ApiError ? error : null;
      if (!apiError) console.error('[api]', request.method, new URL(request.url).pathname, error);
      const e = apiError ?? new ApiError('internal:server');
      return NextResponse.json(e.toJSON(), { status: e.status, headers: e.headers });
    }
  };
}

export function json(data: unknown, status = 200): Response {
  return NextResponse.json(data, { status });
}
