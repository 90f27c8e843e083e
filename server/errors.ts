import type { JobIssue } from "../core/index.js";

/** Every error the HTTP API returns: a stable code, its status and a sentence. README "Errors" lists the same set. */
export const errors = {
  ERR_INPUT_INVALID: { statusCode: 400, message: "The job document has problems; each is listed with its field." },
  ERR_JSON_MALFORMED: { statusCode: 400, message: "The request body is not valid JSON." },
  ERR_BODY_EMPTY: { statusCode: 400, message: "The request body is empty; send a job document as JSON." },
  ERR_UNSUPPORTED_MEDIA_TYPE: { statusCode: 415, message: "Send the job document with Content-Type: application/json." },
  ERR_BODY_TOO_LARGE: { statusCode: 413, message: "The request body is larger than the limit." },
  ERR_DESIGN_TIME_LIMIT: { statusCode: 422, message: "The design took longer than the time limit and was stopped; nothing was stored or changed." },
  ERR_DESIGN_MEMORY_LIMIT: { statusCode: 422, message: "The design needed more than the memory limit and was stopped; nothing was stored or changed." },
  ERR_RESULT_NOT_FINITE: { statusCode: 422, message: "The design gave a number that is not finite, so no result is given; the job lies outside what this program can compute." },
  ERR_HOST_NOT_ALLOWED: { statusCode: 403, message: "This service answers only requests addressed to this machine by a loopback name." },
  ERR_CROSS_SITE: { statusCode: 403, message: "This service takes changes only from its own page; the request came from another site." },
  ERR_NOT_FOUND: { statusCode: 404, message: "There is nothing at this address." },
  ERR_EXAMPLE_NOT_FOUND: { statusCode: 404, message: "There is no example with this id." },
  ERR_PROJECT_NOT_FOUND: { statusCode: 404, message: "There is no project with this id in the job store." },
  ERR_MEMBER_NOT_FOUND: { statusCode: 404, message: "There is no member with this id in this project." },
  ERR_REVISION_NOT_FOUND: { statusCode: 404, message: "This member has no revision with this number." },
  ERR_WORKSHEET_NOT_FOUND: { statusCode: 404, message: "No issued worksheet or saved revision has this fingerprint." },
  ERR_MEMBER_EXISTS: { statusCode: 409, message: "Another member of this project already has this mark; nothing was stored." },
  ERR_PROJECT_FILE_INVALID: { statusCode: 400, message: "The project file has problems, each listed with its path; nothing was stored." },
  ERR_STORE_UNAVAILABLE: { statusCode: 503, message: "The job store could not complete the request; nothing was stored or changed." },
  ERR_BUSY: { statusCode: 503, message: "Too many designs or worksheets are waiting; send the request again after the time in Retry-After." },
  ERR_INTERNAL: { statusCode: 500, message: "The server failed while computing; the input was not stored or changed." },
} as const;

export type ErrorCode = keyof typeof errors;

const reasons: Record<number, string> = {
  400: "Bad Request",
  403: "Forbidden",
  404: "Not Found",
  409: "Conflict",
  413: "Payload Too Large",
  415: "Unsupported Media Type",
  422: "Unprocessable Content",
  500: "Internal Server Error",
  503: "Service Unavailable",
};

export interface ErrorBody {
  statusCode: number;
  code: ErrorCode;
  error: string;
  message: string;
  issues: JobIssue[];
}

export function errorBody(code: ErrorCode, message?: string, issues: JobIssue[] = []): ErrorBody {
  const { statusCode } = errors[code];
  return { statusCode, code, error: reasons[statusCode] ?? "Error", message: message ?? errors[code].message, issues };
}

/** Thrown by route code to answer with one of the codes above. */
export class ApiError extends Error {
  constructor(
    readonly code: ErrorCode,
    message?: string,
    readonly issues: JobIssue[] = [],
    /** ERR_BUSY: when to ask again (the Retry-After header). */
    readonly extra: { retryAfterSeconds?: number } = {},
  ) {
    super(message ?? errors[code].message);
  }
}
