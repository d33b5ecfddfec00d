import type { Application, DiagnosisResult } from "../../schemas/diagnosis.ts";

export interface ApplicationChoice {
  application: Application;
  basis: DiagnosisResult["applicationBasis"];
}

/** Return air below this is a refrigerated room, not an occupied space, °C (common practice). */
const REFRIGERATED_BELOW_C = 12;
/** Return air below this is a freezer, °C (cool rooms run about −2 to +10 °C; common practice). */
const FREEZER_BELOW_C = -8;

/**
 * The application whose bands the rules use: the equipment's when recorded; otherwise inferred
 * from the return (room) air — below −8 °C a freezer, below 12 °C a cool room, else comfort
 * cooling — so a cool room without a recorded application is never judged by comfort bands;
 * comfort cooling when there is no return air either.
 *
 * Units: °C. Source: common practice (cool rooms about −2 to +10 °C, freezers −18 to −25 °C).
 *
 * @throws never
 * @example inferApplication(undefined, 3) // { application: "medium-temperature-refrigeration", basis: "inferred-from-return-air" }
 */
export function inferApplication(
  recorded: Application | undefined,
  returnAirDryBulbC: number | undefined,
): ApplicationChoice {
  if (recorded !== undefined) return { application: recorded, basis: "equipment" };
  if (returnAirDryBulbC === undefined) return { application: "comfort-cooling", basis: "default" };
  const application: Application =
    returnAirDryBulbC < FREEZER_BELOW_C
      ? "low-temperature-refrigeration"
      : returnAirDryBulbC < REFRIGERATED_BELOW_C
        ? "medium-temperature-refrigeration"
        : "comfort-cooling";
  return { application, basis: "inferred-from-return-air" };
}
