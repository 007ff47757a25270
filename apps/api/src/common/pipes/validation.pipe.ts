import { HttpStatus, ValidationPipe, type Type, type ValidationError } from '@nestjs/common';
import { ApiError } from '../errors/api-error';

interface FieldProblem {
  path: string;
  rule: string;
  message: string;
}

function collect(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const path = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.entries(error.constraints ?? {}).map(([rule, message]) => ({
      path,
      rule: rule === 'whitelistValidation' ? 'notAllowed' : rule,
      message: rule === 'whitelistValidation' ? `${path} is not an accepted field` : message,
    }));
    return [...own, ...collect(error.children ?? [], path)];
  });
}

/**
 * The global pipe: strips nothing silently (unknown fields are refused), converts
 * query strings to their declared types, and reports every broken rule by field.
 * `expectedType` is for bodies whose type TypeScript cannot record (generic controllers).
 */
export function createValidationPipe(expectedType?: Type): ValidationPipe {
  return new ValidationPipe({
    expectedType,
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    stopAtFirstError: false,
    exceptionFactory: (errors) => {
      const problems = collect(errors);
      const fields: Record<string, string> = {};
      for (const problem of problems) fields[problem.path] ??= problem.rule;
      return new ApiError(
        HttpStatus.BAD_REQUEST,
        problems.map((problem) => problem.message).join('; '),
        fields,
      );
    },
  });
}
