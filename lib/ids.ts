/** Row ids are UUIDs; anything else in a URL cannot name a row, so pages and routes answer 404 without asking the database. */
export const isUuid = (value: string | null | undefined): value is string =>
  !!value && /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value);
