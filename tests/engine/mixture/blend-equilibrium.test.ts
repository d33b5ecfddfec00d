/**
 * Bubble and dew points of the multi-fluid model against outside values:
 * - the regression values of the reference pack (../shared/reference/README.md §9.4,
 *   computed from the same pack with the model of §7 and converged to 1e-13; they are
 *   printed to 0.001 kPa and 0.01 kg/m³, so the tolerance is half a unit of that last
 *   digit plus 2e-7 relative for the difference in convergence criteria);
 * - the published pseudo-pure bubble/dew equations of Lemmon (Int. J. Thermophys. 24
 *   (2003) 991, Lemmon-IJT-2003) for R410A, R404A, R407C and R507A over −40…+50 °C
 *   (issue 9: fail beyond 0.5 %), and that paper's pseudo-critical points;
 * - the bubble-point enthalpies before the blend-level IIR shift quoted in README §6.
 */
import { describe, expect, it } from "vitest";
import {
  coldStart,
  solveEnvelopePoint,
  traceSaturationCurve,
  blendCriticalPoint,
  type EnvelopeKind,
} from "../../../scripts/eos/mixture/index.ts";
import { createFluidModel, readReferenceFluid } from "../../../scripts/eos/index.ts";
import { blendModel, mixturePackMissingReason, mixturePackPresent, PSEUDO_PURE_BLENDS } from "./mixture-pack.ts";

const KELVIN = 273.15;

/** README §9.4 prints pressures to 0.001 kPa: half a unit of that digit, plus 2e-7 relative for the convergence criteria. */
const REGRESSION_PRESSURE_KPA = { printed: 0.0005, relative: 2e-7 } as const;
/** README §9.4 prints ρ' to 0.01 kg/m³: half a unit of that digit, plus 1e-7 relative for the convergence criteria. */
const REGRESSION_DENSITY_KG_PER_M3 = { printed: 0.005, relative: 1e-7 } as const;
/** README §6 h' and s' before the IIR shift: the source library's ideal-gas parts differ by "a few J/mol" (README §7.3). */
const SHIPPED_REFERENCE_ENTHALPY_KJ_PER_KG = 0.05;
const SHIPPED_REFERENCE_ENTROPY_KJ_PER_KG_K = 2e-4;
/** Issue 9: the mixture model fails beyond 0.5 % of Lemmon's (2003) published pseudo-pure pressures. */
const PSEUDO_PURE_PRESSURE_RELATIVE = 0.005;
/** Lemmon's pseudo-critical point is a fit's, not the mixture's own, so only closeness is asked, K. */
const PSEUDO_CRITICAL_TEMPERATURE_K = 0.1;

/** README §9.4: p_bub / p_dew (kPa) at −20, 0, 40 °C and ρ' (kg/m³) at the 0 °C bubble point. */
const REGRESSION: Record<string, [number, number, number, number, number, number, number]> = {
  R404A: [307.1, 300.192, 610.192, 600.33, 1829.414, 1814.645, 1150.01],
  R407A: [297.435, 234.299, 600.666, 498.339, 1836.96, 1645.072, 1248.93],
  R407C: [279.93, 214.692, 567.869, 460.713, 1749.045, 1541.321, 1236.22],
  R407F: [311.967, 246.157, 629.059, 522.218, 1921.41, 1719.285, 1218.22],
  R410A: [400.659, 399.296, 800.702, 798.054, 2425.644, 2418.698, 1169.98],
  R448A: [311.004, 243.069, 623.343, 510.627, 1883.074, 1659.908, 1196.92],
  R449A: [306.674, 244.009, 614.893, 510.913, 1858.336, 1652.173, 1196.97],
  R452A: [320.089, 272.845, 637.306, 556.771, 1901.92, 1740.568, 1234.13],
  R452B: [387.743, 371.752, 773.593, 744.292, 2334.231, 2265.742, 1092.48],
  R454B: [384.775, 365.498, 767.413, 732.422, 2313.614, 2232.623, 1082.02],
  R454C: [292.599, 212.764, 578.068, 442.207, 1702.125, 1419.432, 1135.6],
  R455A: [371.937, 227.365, 706.434, 472.474, 1966.875, 1520.108, 1125.28],
  R507A: [314.52, 314.394, 624.383, 623.958, 1869.603, 1867.998, 1156.3],
  R513A: [152.073, 151.632, 323.435, 323.176, 1066.735, 1066.707, 1221.37],
  R466A: [394.698, 379.362, 784.003, 753.296, 2352.247, 2273.107, 1407.82],
};

function pointAt(id: string, kind: EnvelopeKind, T: number) {
  const blend = blendModel(id);
  return solveEnvelopePoint(
    blend.model,
    blend.moleFractions,
    kind,
    { temperature: T },
    coldStart(blend.model, blend.moleFractions, kind, T),
  );
}

describe.skipIf(!mixturePackPresent)(
  `blend phase equilibrium (${mixturePackPresent ? "mixture pack found" : mixturePackMissingReason})`,
  () => {
    it.each(Object.keys(REGRESSION))("%s reproduces the pack's regression values (README §9.4)", (id) => {
      const expected = REGRESSION[id]!;
      const within = (valueKPa: number, target: number) =>
        expect(Math.abs(valueKPa - target)).toBeLessThanOrEqual(
          REGRESSION_PRESSURE_KPA.printed + REGRESSION_PRESSURE_KPA.relative * target,
        );
      [-20, 0, 40].forEach((celsius, k) => {
        const bubble = pointAt(id, "bubble", celsius + KELVIN);
        const dew = pointAt(id, "dew", celsius + KELVIN);
        within(bubble.p / 1000, expected[2 * k]!);
        within(dew.p / 1000, expected[2 * k + 1]!);
        expect(bubble.p).toBeGreaterThanOrEqual(dew.p);
        if (celsius === 0) {
          const rhoLiquid = bubble.bulkDensity * blendModel(id).molarMass;
          expect(Math.abs(rhoLiquid - expected[6]!)).toBeLessThanOrEqual(
            REGRESSION_DENSITY_KG_PER_M3.printed + REGRESSION_DENSITY_KG_PER_M3.relative * expected[6]!,
          );
        }
      });
    });

    // README §6: bubble-point liquid at 0 °C with the components on their shipped (IIR)
    // reference, before the blend-level shift. The source library evaluates the ideal-gas
    // parts with STATES.critical instead of the reducing point (README §7.3, "a few J/mol"
    // for blends with R134a), hence 0.05 kJ/kg and 0.2 J/(kg·K).
    it.each([
      ["R410A", 201.214, 1.07073],
      ["R454B", 206.526, 1.07402],
      ["R455A", 205.678, 1.09228],
      ["R513A", 202.409, 1.05756],
    ] as const)("%s bubble-point h' and s' at 0 °C before the IIR shift match README §6", (id, h, s) => {
      const blend = blendModel(id);
      const bubble = pointAt(id, "bubble", KELVIN);
      const saved = [blend.model.enthalpyOffset, blend.model.entropyOffset] as const;
      blend.model.enthalpyOffset = 0;
      blend.model.entropyOffset = 0;
      const caloric = blend.model.caloric(KELVIN, bubble.bulkDensity, blend.moleFractions);
      [blend.model.enthalpyOffset, blend.model.entropyOffset] = saved;
      expect(Math.abs(caloric.h / blend.molarMass / 1000 - h)).toBeLessThan(SHIPPED_REFERENCE_ENTHALPY_KJ_PER_KG);
      expect(Math.abs(caloric.s / blend.molarMass / 1000 - s)).toBeLessThan(SHIPPED_REFERENCE_ENTROPY_KJ_PER_KG_K);
    });

    const worstDeviation = new Map<string, { bubble: number; dew: number }>();

    it.each(PSEUDO_PURE_BLENDS)(
      "%s: mixture-model bubble and dew pressures stay within 0.5 % of Lemmon's (2003) published equations over −40…+50 °C",
      (id) => {
        const blend = blendModel(id);
        const pseudo = createFluidModel(readReferenceFluid(id));
        const temperatures = Array.from({ length: 91 }, (_, k) => -40 + k + KELVIN);
        const worst = { bubble: 0, dew: 0 };
        for (const kind of ["bubble", "dew"] as const) {
          const curve = traceSaturationCurve(blend, kind, temperatures);
          expect(curve).toHaveLength(temperatures.length);
          const published = kind === "bubble" ? pseudo.bubblePressureCurve : pseudo.dewPressureCurve;
          for (const point of curve) {
            worst[kind] = Math.max(worst[kind], Math.abs(point.p / published.value(point.T) - 1));
          }
        }
        worstDeviation.set(id, worst);
        console.info(
          `${id} mixture model vs Lemmon 2003 pL/pV, −40…+50 °C: bubble ${(worst.bubble * 100).toFixed(3)} %, dew ${(worst.dew * 100).toFixed(3)} %`,
        );
        expect(worst.bubble).toBeLessThan(PSEUDO_PURE_PRESSURE_RELATIVE);
        expect(worst.dew).toBeLessThan(PSEUDO_PURE_PRESSURE_RELATIVE);
      },
    );

    // Lemmon 2003 pseudo-critical points (STATES.critical of the pseudo-pure files, README §9.1)
    it.each(PSEUDO_PURE_BLENDS)(
      "%s: the mixture critical point lies within 0.1 K and 0.5 % of Lemmon's (2003) pseudo-critical point",
      (id) => {
        const blend = blendModel(id);
        const critical = readReferenceFluid(id).STATES.critical;
        const curve = traceSaturationCurve(
          blend,
          "bubble",
          Array.from({ length: 400 }, (_, k) => critical.T - 10 + 0.05 * k),
          [pointAt(id, "bubble", critical.T - 12)],
        );
        const found = blendCriticalPoint(blend, curve[curve.length - 1]!);
        expect(Math.abs(found.T - critical.T)).toBeLessThan(PSEUDO_CRITICAL_TEMPERATURE_K);
        expect(Math.abs(found.p / critical.p - 1)).toBeLessThan(PSEUDO_PURE_PRESSURE_RELATIVE);
      },
    );
  },
);
