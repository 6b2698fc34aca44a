/**
 * One error type for every API route. The code decides the HTTP status and the
 * message the client sees; anything that is not an ApiError is logged on the server
 * and reaches the client only as a generic 500.
 */

export type ApiErrorCode =
  | 'bad_request:body'
  | 'bad_request:json'
  | 'bad_request:validation'
  | 'unauthorized:session'
  | 'unauthorized:credentials'
  | 'forbidden:workspace'
  | 'forbidden:admin'
  | 'not_found:workspace'
  | 'not_found:member'
  | 'not_found:project'
  | 'not_found:invitation'
  | 'not_found:mail'
  | 'not_found:route'
  | 'not_found:run'
  | 'not_found:scan'
  | 'conflict:email'
  | 'conflict:slug'
  | 'conflict:project-name'
  | 'conflict:member'
  | 'conflict:invitation'
  | 'conflict:last-owner'
  | 'payload_too_large:body'
  | 'unprocessable:token'
  | 'unprocessable:invitation-email'
  | 'unprocessable:run-file'
  | 'unprocessable:result-mismatch'
  | 'unprocessable:vector'
  | 'rate_limited:sign-in'
  | 'internal:server';

const statusByPrefix: Record<string, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unprocessable: 422,
  rate_limited: 429,
  internal: 500,
};

const defaultMessages: Record<ApiErrorCode, string> = {
  'bad_request:body': 'The request body is missing or not a JSON object.',
  'bad_request:json': 'The request body is not valid JSON.',
  'bad_request:validation': 'Some fields are missing or invalid.',
  'unauthorized:session': 'You need to sign in first.',
  'unauthorized:credentials': 'That e-mail and password do not match an account.',
  'forbidden:workspace': 'Your role in this workspace does not allow that.',
  'forbidden:admin': 'Only site admins can see this.',
  'not_found:workspace': 'No such workspace, or you are not a member of it.',
  'not_found:member': 'No such member in this workspace.',
  'not_found:project': 'No such project in this workspace.',
  'not_found:invitation': 'No such invitation.',
  'not_found:mail': 'No such message in the outbox.',
  'not_found:route': 'No such API route.',
  'not_found:run': 'No such run in this workspace.',
  'not_found:scan': 'No such scan in this workspace.',
  'conflict:email': 'An account with that e-mail already exists.',
  'conflict:slug': 'That workspace address is already taken.',
  'conflict:project-name': 'This workspace already has a project with that name.',
  'conflict:member': 'That person is already a member of this workspace.',
  'conflict:invitation': 'An invitation for that e-mail is already pending.',
  'conflict:last-owner': 'A workspace needs at least one owner; make someone else owner first.',
  'payload_too_large:body': 'The request body is too large.',
  'unprocessable:token': 'This link is invalid, expired or already used.',
  'unprocessable:invitation-email': 'This invitation was sent to a different e-mail address.',
  'unprocessable:run-file': 'The run file is not valid.',
  'unprocessable:result-mismatch': 'The result was not computed from this run file (the run-file hash differs).',
  'unprocessable:vector': 'The CI vector data is not valid.',
  'rate_limited:sign-in': 'Too many failed sign-in attempts. Try again later.',
  'internal:server': 'Something went wrong on the server.',
};

export class ApiError extends Error {
  readonly code: ApiErrorCode;
  readonly status: number;
  readonly fields?: Record<string, string[]>;
  readonly headers?: Record<string, string>;

  constructor(
    code: ApiErrorCode,
    options: { message?: string; fields?: Record<string, string[]>; headers?: Record<string, string> } = {},
  ) {
    super(options.message ?? defaultMessages[code]);
    this.name = 'ApiError';
    this.code = code;
    this.status = statusByPrefix[code.split(':')[0]] ?? 500;
    this.fields = options.fields;
    this.headers = options.headers;
  }

  toJSON(): ApiErrorBody {
    const error: ApiErrorBody['error'] = { code: this.code, message: this.message };
    if (this.fields) error.fields = this.fields;
    return { error };
  }
}

export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string[]> };
}

export function statusForCode(code: ApiErrorCode): number {
  return new ApiError(code).status;
}
