/**
 * Headers of `GET /api/visits/:id` that name the visit's unit and its refrigerant, as the body
 * does. The browser's first requests (src/lib/api/first-requests.ts) read them as soon as the
 * visit's headers arrive and ask for the unit and the refrigerant's table then, without waiting
 * for the body or parsing it: with a logger's readings the body is 800 kB of JSON, which the
 * screen parses once anyway. Kept out of shared/schemas so that the entry chunk, which reads
 * these two names, never takes in the contracts' chunk.
 */
export const VISIT_EQUIPMENT_HEADER = "Visit-Equipment-Id";
export const VISIT_REFRIGERANT_HEADER = "Visit-Refrigerant";
