import { applyDecorators, type Type } from '@nestjs/common';
import { Type as TransformType } from 'class-transformer';
import { isTimeZone } from '@skyledger/contracts';
import {
  IsBoolean,
  IsDateString,
  IsIn,
  IsInt,
  IsISO8601,
  IsObject,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateBy,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../transforms';

/**
 * Field decorators for request DTOs, one per kind of field, so every DTO states the same
 * rules the zod schemas of packages/contracts state for the desk's forms.
 */

const maybe = (optional: boolean, ...decorators: PropertyDecorator[]) =>
  applyDecorators(...(optional ? [IsOptional()] : []), ...decorators);

/** Trimmed text, required unless `optional`; an optional field may not be sent empty. */
export const TextField = (max: number, { optional = false } = {}) =>
  maybe(optional, Trim(), IsString(), IsNotEmpty(), MaxLength(max));

export const EnumField = <T extends string>(values: readonly T[], { optional = false } = {}) =>
  maybe(optional, IsIn(values, { message: `$property must be one of: ${values.join(', ')}` }));

export const BooleanField = ({ optional = false } = {}) => maybe(optional, IsBoolean());

export const UuidField = ({ optional = false } = {}) =>
  maybe(optional, IsUUID('all', { message: '$property must be a UUID' }));

/** An http(s) address only: javascript:, data: and file: URLs are refused. */
export const WebUrlField = ({ optional = false } = {}) =>
  maybe(
    optional,
    Trim(),
    IsUrl(
      { protocols: ['http', 'https'], require_protocol: true, require_tld: false },
      { message: '$property must be a web address starting with http:// or https://' },
    ),
    MaxLength(2048),
  );

/** An instant with its offset (`2026-11-30T18:05:00+01:00`). */
export const InstantField = ({ optional = false } = {}) =>
  maybe(
    optional,
    IsISO8601(
      { strict: true, strictSeparator: true },
      { message: '$property must be a date and time with its offset, e.g. 2026-11-30T18:05:00Z' },
    ),
    Matches(/T.*(Z|[+-]\d{2}:\d{2})$/, {
      message: '$property must give its offset (Z or ±hh:mm)',
    }),
  );

/** A calendar date, `YYYY-MM-DD`. */
export const DateField = ({ optional = false } = {}) =>
  maybe(
    optional,
    IsDateString({ strict: true }, { message: '$property must be a date as YYYY-MM-DD' }),
    Matches(/^\d{4}-\d{2}-\d{2}$/, { message: '$property must be a date as YYYY-MM-DD' }),
  );

export const TimeZoneField = ({ optional = false } = {}) =>
  maybe(
    optional,
    IsString(),
    ValidateBy({
      name: 'isTimeZone',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && isTimeZone(value),
        defaultMessage: () => '$property must be an IANA time zone, e.g. Europe/London',
      },
    }),
  );

export const IntField = (min: number, max: number, { optional = false } = {}) =>
  maybe(optional, IsInt(), Min(min), Max(max));

/** The version the editor last saw; a stale one gets 409. */
export const VersionField = () =>
  applyDecorators(IsInt({ message: 'version must be a whole number' }), Min(1));

/**
 * A nested object checked against its own DTO. An array or any other non-object is
 * refused outright: `ValidateNested` alone would let an empty array through.
 */
export const NestedField = (type: () => Type<unknown>, { optional = false } = {}) =>
  maybe(
    optional,
    IsObject({ message: '$property must be an object' }),
    ValidateNested(),
    TransformType(type),
  );
