/** The one error shape every API route answers with (4xx and 5xx alike). */
export interface FieldError {
  /** Dotted path of the offending request field, e.g. `email` or `items.0.grams`. */
  field: string;
  message: string;
}

export interface ErrorResponse {
  statusCode: number;
  /** The HTTP reason phrase, e.g. `Bad Request`. */
  error: string;
  /** A sentence a person can read; never a stack trace or SQL. */
  message: string;
  details?: FieldError[];
}
