// A query's refusal: the row asked for is missing, or the change would break a rule the rows keep
// (an e-mail or a name already in use, a member twice, a review already decided). The data layer
// says so in plain words and, for bad input, on the field to fix; lib/server/errors.ts toAppError
// turns it into the AppError of the same kind, so db/queries need nothing from lib/server.

type RefusalKind = "bad_request" | "not_found" | "conflict";

export class Refusal extends Error {
  readonly kind: RefusalKind;
  readonly fields?: Record<string, string[]>;

  constructor(kind: RefusalKind, message: string, fields?: Record<string, string[]>) {
    super(message);
    this.name = "Refusal";
    this.kind = kind;
    this.fields = fields;
  }
}
