import { Catch, HttpException, HttpStatus, Logger, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import type { ApiErrorBody } from '@fuelwright/shared';

const REASON: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
};

/** Gives every error the one shape of ApiErrorBody; unexpected errors are logged, not leaked. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly log = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    let body: ApiErrorBody;
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const raw = exception.getResponse();
      const obj = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
      let message = typeof raw === 'string' ? raw : obj.message;
      if (Array.isArray(message)) message = message.join('; ');
      if (status === HttpStatus.TOO_MANY_REQUESTS) message = 'Too many attempts. Wait a minute and try again.';
      body = {
        statusCode: status,
        error: REASON[status] ?? (typeof obj.error === 'string' ? obj.error : 'Error'),
        message: typeof message === 'string' && message ? message : exception.message,
      };
      if (obj.fields && typeof obj.fields === 'object') body.fields = obj.fields as Record<string, string[]>;
      const path = host.switchToHttp().getRequest<{ path?: string }>().path ?? '';
      if (status === HttpStatus.PAYLOAD_TOO_LARGE && /\/photos$/.test(path)) {
        // The upload limit, hit before the handler ran (multer): name the field like every other 4xx.
        body.message = 'A photo may be at most 15 MB.';
        body.fields = { file: [body.message] };
      }
    } else if (isBodyParserError(exception)) {
      body = { statusCode: exception.status, error: REASON[exception.status] ?? 'Bad Request', message: exception.status === 413 ? 'The request body is too large.' : 'The request body is not valid JSON.' };
    } else {
      this.log.error(exception instanceof Error ? exception.stack ?? exception.message : String(exception));
      body = { statusCode: 500, error: REASON[500], message: 'Something went wrong on the server. Nothing was saved.' };
    }
    res.status(body.statusCode).json(body);
  }
}

function isBodyParserError(e: unknown): e is { status: number; type: string } {
  return typeof e === 'object' && e !== null && typeof (e as { status?: unknown }).status === 'number' && typeof (e as { type?: unknown }).type === 'string';
}
