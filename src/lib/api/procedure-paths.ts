/**
 * Where a visit's procedure records live in the API and in the query cache, on their own without
 * the records' schemas: the outbox, which every screen loads, reads them too (README decision 023).
 */

/** The kinds of procedure record, as their API paths and query keys name them. */
export const PROCEDURE_RECORD_KINDS = [
  "electrical-checks",
  "leak-searches",
  "standing-pressure-checks",
  "pressure-tests",
  "evacuations",
] as const;
export type ProcedureRecordKind = (typeof PROCEDURE_RECORD_KINDS)[number];

/** Where a visit's records of one kind are listed and created; the outbox sends kept entries there too. */
export const procedureRecordsPath = (kind: ProcedureRecordKind, visitId: string) => `/visits/${visitId}/${kind}`;
/** Where an evacuation's samples are added (named by its id, or by its client id while it is only on the device). */
export const evacuationSamplesPath = (visitId: string, evacuationId: string) =>
  `/visits/${visitId}/evacuations/${evacuationId}/samples`;

/** The query key of one kind of a visit's procedure records. */
export const procedureRecordsKey = (kind: ProcedureRecordKind, visitId: string) =>
  ["procedures", kind, visitId] as const;
