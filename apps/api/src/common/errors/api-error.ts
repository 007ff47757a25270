import { HttpException, HttpStatus } from '@nestjs/common';
import { type ApiErrorBody } from '@skyledger/contracts';
import { STATUS_CODES } from 'node:http';

/**
 * An error for the client in the API's one error shape, optionally naming the fields and
 * the rule each broke (`{ email: 'taken' }`). Throw it from services for rule
 * violations; validation failures become one through the global ValidationPipe.
 */
export class ApiError extends HttpException {
  constructor(status: HttpStatus, message: string, fields?: Record<string, string>) {
    const body: ApiErrorBody = {
      statusCode: status,
      error: STATUS_CODES[status] ?? 'Error',
      message,
      ...(fields ? { fields } : {}),
    };
    super(body, status);
  }

  static conflict(message: string, fields?: Record<string, string>) {
    return new ApiError(HttpStatus.CONFLICT, message, fields);
  }

  static unprocessable(message: string, fields?: Record<string, string>) {
    return new ApiError(HttpStatus.UNPROCESSABLE_ENTITY, message, fields);
  }

  /** A write carried a version the row has moved past: nothing was overwritten. */
  static stale(what: string, currentVersion: number) {
    return new ApiError(
      HttpStatus.CONFLICT,
      `${what} was changed by someone else meanwhile (now version ${currentVersion}); reload and try again`,
      { version: 'stale' },
    );
  }
}
