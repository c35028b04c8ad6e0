/**
 * Collects the values of one SQL statement as bound parameters ($1, $2, …). Request values only
 * ever enter the statement through add(); the SQL text is built from fixed fragments alone.
 */
export class BoundParams {
  readonly values: unknown[] = [];

  add(value: unknown): string {
    this.values.push(value);
    return `$${this.values.length}`;
  }
}
