/**
 * Every error the API returns has this shape. A 400 from validation also carries `fields`:
 * one entry per rejected field (dotted path for nested fields), each with its messages.
 */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: Record<string, string[]>;
}
