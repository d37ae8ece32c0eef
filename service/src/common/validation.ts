import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';

/** Flattens class-validator's tree into `{ "setup.mainJet": ["..."] }`. */
export function fieldsOf(errors: ValidationError[], prefix = ''): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const e of errors) {
    const path = prefix ? `${prefix}.${e.property}` : e.property;
    if (e.constraints) {
      out[path] = Object.entries(e.constraints).map(([kind, msg]) =>
        kind === 'whitelistValidation' ? `${path} is not a field this request takes` : msg,
      );
    }
    if (e.children?.length) Object.assign(out, fieldsOf(e.children, path));
  }
  return out;
}

export class FieldsBadRequest extends BadRequestException {
  constructor(fields: Record<string, string[]>, message?: string) {
    const names = Object.keys(fields);
    super({ message: message ?? `Check ${names.length === 1 ? 'this field' : 'these fields'}: ${names.join(', ')}.`, fields });
  }
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new FieldsBadRequest(fieldsOf(errors)),
  });
}
