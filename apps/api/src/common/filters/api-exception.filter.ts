import {
  Catch,
  HttpException,
  HttpStatus,
  Logger,
  type ArgumentsHost,
  type ExceptionFilter,
} from '@nestjs/common';
import { type ApiErrorBody } from '@skyledger/contracts';
import { type Response } from 'express';
import { STATUS_CODES } from 'node:http';
import { QueryFailedError } from 'typeorm';

function body(statusCode: number, message: string): ApiErrorBody {
  return { statusCode, error: STATUS_CODES[statusCode] ?? 'Error', message };
}

/** Errors raised by Express middleware (the JSON body parser) carry a status and a type. */
function isClientHttpError(
  value: unknown,
): value is { status: number; type?: string; message: string } {
  if (typeof value !== 'object' || value === null) return false;
  const status = (value as { status?: unknown }).status;
  return typeof status === 'number' && status >= 400 && status < 500;
}

const bodyParserMessages: Record<string, string> = {
  'entity.parse.failed': 'The request body is not valid JSON',
  'entity.too.large': 'The request body is too large',
  'encoding.unsupported': 'The request body has an unsupported encoding',
  'charset.unsupported': 'The request body has an unsupported charset',
};

/** Driver codes meaning the database cannot be reached now (not that a query was wrong). */
const unavailableCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'ER_CON_COUNT_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_QUERY_INTERRUPTED',
  'ER_CONNECTION_KILLED',
]);

/** True when the error (or what it wraps) says the database is down or unreachable. */
export function isDatabaseUnavailable(exception: unknown): boolean {
  for (let error = exception, depth = 0; error && depth < 4; depth += 1) {
    const code = (error as { code?: unknown }).code;
    if (typeof code === 'string' && unavailableCodes.has(code)) return true;
    error =
      (error as { driverError?: unknown }).driverError ?? (error as { cause?: unknown }).cause;
  }
  return false;
}

export function toErrorBody(exception: unknown): ApiErrorBody {
  // Nest's Express adapter wraps body-parser errors; their own type says more than their text.
  const parserError = exception instanceof HttpException ? exception.cause : exception;
  const parserMessage = isClientHttpError(parserError)
    ? bodyParserMessages[parserError.type ?? '']
    : undefined;
  if (isClientHttpError(parserError) && parserMessage)
    return body(parserError.status, parserMessage);
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const response = exception.getResponse();
    if (typeof response === 'string') return body(status, response);
    const { message, fields } = response as { message?: unknown; fields?: Record<string, string> };
    const text = Array.isArray(message)
      ? message.join('; ')
      : typeof message === 'string'
        ? message
        : exception.message;
    return { ...body(status, text), ...(fields ? { fields } : {}) };
  }
  if (isClientHttpError(exception)) return body(exception.status, exception.message);
  if (isDatabaseUnavailable(exception)) {
    return body(
      HttpStatus.SERVICE_UNAVAILABLE,
      'The desk’s database cannot be reached just now. Try again in a moment',
    );
  }
  if (
    exception instanceof QueryFailedError &&
    (exception.driverError as { code?: string }).code === 'ER_DUP_ENTRY'
  ) {
    return body(HttpStatus.CONFLICT, 'This conflicts with a record that already exists');
  }
  return body(
    HttpStatus.INTERNAL_SERVER_ERROR,
    'Something went wrong on our side; the error has been logged',
  );
}

/** Every failure leaves the API in the one error shape, `{ statusCode, error, message, fields? }`. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const errorBody = toErrorBody(exception);
    if (errorBody.statusCode >= 500) {
      this.logger.error(
        exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
      );
    }
    if (response.headersSent) return;
    if (errorBody.statusCode === HttpStatus.SERVICE_UNAVAILABLE)
      response.setHeader('Retry-After', '5');
    response.status(errorBody.statusCode).json(errorBody);
  }
}
