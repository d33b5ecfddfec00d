import type { MeteringDevice } from "../../schemas/diagnosis.ts";
import type { MeteringFamily } from "./signature-table.ts";

/**
 * The metering family of a device: a TXV or EEV holds superheat, so subcooling carries its
 * charge signal; a fixed orifice or capillary cannot adjust, so superheat does (TRADE.md §2
 * notes [S9][S10][S11]).
 *
 * @throws never
 * @example meteringFamilyOf("capillary") // "fixed"
 */
export function meteringFamilyOf(device: MeteringDevice): MeteringFamily {
  return device === "fixed-orifice" || device === "capillary" ? "fixed" : "expansion-valve";
}
