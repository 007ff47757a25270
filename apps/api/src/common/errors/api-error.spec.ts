import { HttpStatus } from '@nestjs/common';
import { toErrorBody } from '../filters/api-exception.filter';
import { ApiError } from './api-error';

describe('the one error shape', () => {
  it('keeps the fields of an ApiError', () => {
    expect(toErrorBody(ApiError.conflict('taken', { email: 'taken' }))).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: 'taken',
      fields: { email: 'taken' },
    });
  });

  it('names a stale version as such', () => {
    const body = toErrorBody(ApiError.stale('This person', 4));
    expect(body.statusCode).toBe(HttpStatus.CONFLICT);
    expect(body.fields).toEqual({ version: 'stale' });
    expect(body.message).toContain('version 4');
  });

  it('turns a JSON body-parser failure into a 400 that says so', () => {
    const parserError = Object.assign(new SyntaxError('Unexpected token'), {
      status: 400,
      type: 'entity.parse.failed',
    });
    expect(toErrorBody(parserError)).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON',
    });
  });

  it('never leaks the text of an unexpected error', () => {
    const body = toErrorBody(new Error('connect ECONNREFUSED 127.0.0.1:3307'));
    expect(body.statusCode).toBe(500);
    expect(body.message).not.toContain('ECONNREFUSED');
  });
});
