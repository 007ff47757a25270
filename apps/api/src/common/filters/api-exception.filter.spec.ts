import { QueryFailedError } from 'typeorm';
import { toErrorBody } from './api-exception.filter';

describe('toErrorBody', () => {
  it('answers 503 when the database cannot be reached, however the driver says so', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:3307'), {
      code: 'ECONNREFUSED',
    });
    const lost = new QueryFailedError(
      'SELECT 1',
      [],
      Object.assign(new Error('lost'), { code: 'PROTOCOL_CONNECTION_LOST' }),
    );
    const wrapped = Object.assign(new Error('pool'), { cause: refused });
    for (const error of [refused, lost, wrapped]) {
      expect(toErrorBody(error)).toMatchObject({ statusCode: 503, error: 'Service Unavailable' });
    }
  });

  it('keeps 500 for what is our fault, and 409 for a duplicate', () => {
    expect(toErrorBody(new Error('bug')).statusCode).toBe(500);
    const duplicate = new QueryFailedError(
      'INSERT',
      [],
      Object.assign(new Error('dup'), { code: 'ER_DUP_ENTRY' }),
    );
    expect(toErrorBody(duplicate).statusCode).toBe(409);
  });
});
