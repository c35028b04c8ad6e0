import { QueryTypes } from 'sequelize';
import { AppError } from '../../lib/errors';
import { Visit } from '../visits/visits.model';

// The browser's time zone list (ICU) and PostgreSQL's (tzdata) differ a little: a zone one knows
// and the other does not would fail the query with a 500. PostgreSQL's names are read once, on first
// use, and kept for the life of the process (a failed read is tried again on the next request).

let names: Promise<Set<string>> | undefined;

function databaseTimeZones(): Promise<Set<string>> {
  names ??= Visit.sequelize!
    .query<{ name: string }>('SELECT name FROM pg_timezone_names', { type: QueryTypes.SELECT })
    .then((rows) => new Set(rows.map((r) => r.name.toLowerCase())))
    .catch((err: unknown) => {
      names = undefined;
      throw err;
    });
  return names;
}

/** Refuses a time zone PostgreSQL does not know, naming the field; PostgreSQL's own names are case-insensitive. */
export async function assertDatabaseTimeZone(tz: string): Promise<void> {
  if (!(await databaseTimeZones()).has(tz.toLowerCase())) {
    throw new AppError(400, 'invalid_input', 'Some fields in the query string need attention.', {
      tz: `The database does not know the time zone "${tz}". Use a name from the IANA list such as Europe/Berlin or America/Chicago.`,
    });
  }
}
