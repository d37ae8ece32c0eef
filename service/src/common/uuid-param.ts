import { NotFoundException, Param, ParseUUIDPipe } from '@nestjs/common';

/** A route id that must be a UUID; anything else is simply "no such item" (404). */
export const UuidParam = (name: string, what: string) =>
  Param(name, new ParseUUIDPipe({ exceptionFactory: () => new NotFoundException(`No such ${what}.`) }));
