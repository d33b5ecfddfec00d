import { z } from "zod";

/** GET /api/equipment/refrigerants: the refrigerants of the organisation's units in use, each once. */
export const RefrigerantsInUseSchema = z.object({ refrigerants: z.array(z.string()) });
export type RefrigerantsInUse = z.infer<typeof RefrigerantsInUseSchema>;
