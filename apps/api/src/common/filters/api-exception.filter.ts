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
    response.status(errorBody.statusCode).json(errorBody);
  }
}
