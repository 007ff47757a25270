import { type PhysicalConstant } from './physical-constant.js';

export const secondsPerDay: PhysicalConstant = {
  key: 'seconds_per_day',
  name: 'Seconds in a day',
  value: 86400,
  unit: 's',
  uncertainty: { kind: 'exact' },
  source: 'Wilkins1989',
  note: 'The day of 86 400 SI seconds, the unit the IAU uses with the Julian year.',
};

export const daysPerJulianYear: PhysicalConstant = {
  key: 'days_per_julian_year',
  name: 'Days in a Julian year',
  value: 365.25,
  unit: '',
  uncertainty: { kind: 'exact' },
  source: 'Wilkins1989',
  note: 'The IAU year (annum, a) is the Julian year of 365.25 days; mathjs uses the same year.',
};

export const secondsPerYear: PhysicalConstant = {
  key: 'seconds_per_year',
  name: 'Seconds in a (Julian) year',
  value: daysPerJulianYear.value * secondsPerDay.value,
  unit: 's',
  uncertainty: { kind: 'exact' },
  source: 'Wilkins1989',
  derivedFrom: [daysPerJulianYear.key, secondsPerDay.key],
  formula: '365.25 d × 86 400 s/d',
};
