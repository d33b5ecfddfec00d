/**
 * How each charge state reads on screen: a short verdict in Satura's own words and the
 * usual next step. Trade terms (undercharge, restriction, non-condensables) stay as the
 * trade says them.
 */
import type { ChargeState } from "../schemas/diagnosis.ts";

export interface ChargeStateText {
  /** Headline verdict. */
  title: string;
  /** Two or three words for tight places (timeline, tables). */
  short: string;
  /** What a technician usually checks or does next. */
  nextStep: string;
}

export const chargeStateText: Record<ChargeState, ChargeStateText> = {
  normal: {
    title: "Charge and flow look right",
    short: "In band",
    nextStep: "Record the settled readings and finish the checks.",
  },
  undercharged: {
    title: "Undercharged",
    short: "Under",
    nextStep: "Find and fix the leak before adding refrigerant; weigh in what you add.",
  },
  overcharged: {
    title: "Overcharged",
    short: "Over",
    nextStep: "Recover refrigerant in small steps into a weighed cylinder and let it settle.",
  },
  "restricted-metering": {
    title: "Restriction at the metering device or liquid line",
    short: "Restriction",
    nextStep: "Feel for a temperature drop across the filter drier and metering device; check the TXV bulb.",
  },
  "low-evaporator-airflow": {
    title: "Low airflow across the evaporator",
    short: "Low evap air",
    nextStep:
      "Check filters, coil (ice), fan speed and belts, and on refrigeration the defrost, before touching the charge.",
  },
  "overfeeding-metering": {
    title: "Metering device overfeeding",
    short: "Overfeeding",
    nextStep:
      "Check the TXV bulb is tight, insulated and at the right spot on the suction line, then the valve setting; a stuck or oversized valve (or orifice) needs replacing. Do not add refrigerant.",
  },
  "condenser-airflow": {
    title: "Condenser not rejecting heat",
    short: "Condenser air",
    nextStep: "Clean the condenser coil, check the fan and look for air recirculating from the discharge.",
  },
  "non-condensables": {
    title: "Non-condensables in the circuit",
    short: "Non-cond.",
    nextStep: "Confirm with a standing-pressure check, then recover, evacuate and recharge by weight.",
  },
  "weak-compressor": {
    title: "Compressor not pumping well",
    short: "Weak comp.",
    nextStep: "Check the pressure difference it can pull and how fast pressures equalise after stopping.",
  },
  "insufficient-data": {
    title: "Not enough to go on yet",
    short: "Need data",
    nextStep: "Enter the missing readings, or weigh in the charge where no target applies.",
  },
};
