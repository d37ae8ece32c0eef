import { registerDecorator, type ValidationOptions } from 'class-validator';
import { isCalendarDate, latestAllowedDate } from '@fuelwright/shared';

/** A calendar date (YYYY-MM-DD) that is not in the future. */
export function IsPastOrTodayDate(what: string, options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isPastOrTodayDate',
      target: object.constructor,
      propertyName,
      options,
      validator: {
        validate: (value: unknown) => isCalendarDate(value) && value <= latestAllowedDate() && value >= '1970-01-01',
        defaultMessage: () => `${propertyName} must be a date written YYYY-MM-DD, not in the future: ${what}`,
      },
    });
}
