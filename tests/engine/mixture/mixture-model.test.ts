/**
 * Unit tests of the multi-fluid mixture model (scripts/eos/mixture) against the
 * model's own definition in the reference pack (../shared/reference/README.md §7,
 * after Kunz & Wagner 2012 and Lemmon & Jacobsen 2004): reducing functions, departure
 * terms, and fugacities by numerical differentiation of the total residual Helmholtz
 * energy n·α^r.
 */
import { describe, expect, it } from "vitest";
import {
  compileDepartureFunction,
  createReducingFunctions,
  readBinaryPairs,
  readDepartureFunctions,
  solveLinearSystem,
  coldStart,
  solveEnvelopePoint,
} from "../../../scripts/eos/mixture/index.ts";
import { createResidualDerivatives, readReferenceFluid, createFluidModel } from "../../../scripts/eos/index.ts";
import { blendModel, mixturePackMissingReason, mixturePackPresent } from "./mixture-pack.ts";

const close = (value: number, expected: number, relative: number) =>
  expect(Math.abs(value - expected)).toBeLessThanOrEqual(relative * Math.max(1, Math.abs(expected)));

describe("reducing functions (README §7.2, Kunz & Wagner 2012 eqs. 7.9–7.10)", () => {
  // R32 and R125 reducing values (pack files) with arbitrary non-trivial parameters
  const Tc = [351.255, 339.173];
  const rhoc = [8150.08, 4779];
  const pair = { i: 0, j: 1, betaT: 1.03, gammaT: 0.97, betaV: 0.98, gammaV: 1.05 };

  it("reduce to the pure component as x → 1", () => {
    const f = createReducingFunctions(Tc, rhoc, [pair]);
    expect(f.evaluate([1, 0]).temperature).toBe(Tc[0]);
    expect(f.evaluate([1, 0]).density).toBeCloseTo(rhoc[0]!, 9);
    expect(f.evaluate([0, 1]).temperature).toBe(Tc[1]);
    close(f.evaluate([1 - 1e-9, 1e-9]).temperature, Tc[0]!, 1e-8);
  });

  it("do not depend on component order when β is inverted (README §7.2: β_ji = 1/β_ij)", () => {
    const forward = createReducingFunctions(Tc, rhoc, [pair]).evaluate([0.3, 0.7]);
    const reverse = createReducingFunctions([...Tc].reverse(), [...rhoc].reverse(), [
      { i: 0, j: 1, betaT: 1 / pair.betaT, gammaT: pair.gammaT, betaV: 1 / pair.betaV, gammaV: pair.gammaV },
    ]).evaluate([0.7, 0.3]);
    close(reverse.temperature, forward.temperature, 1e-14);
    close(reverse.density, forward.density, 1e-14);
    close(reverse.dTemperature[0]!, forward.dTemperature[1]!, 1e-13);
    close(reverse.dVolume[1]!, forward.dVolume[0]!, 1e-13);
  });

  it("with β = 1 reproduce the Lemmon–Jacobsen linear form T_r = Σ x T_c + x_i x_j ξ (README §7.2)", () => {
    const xi = 28.95; // R32/R125, Lemmon & Jacobsen 2004 (binary_pairs.json)
    const zeta = -6.008e-6;
    const v = rhoc.map((r) => 1 / r);
    const gammaT = (Tc[0]! + Tc[1]! + xi) / (2 * Math.sqrt(Tc[0]! * Tc[1]!));
    const gammaV = (v[0]! + v[1]! + zeta) / (Math.pow(Math.cbrt(v[0]!) + Math.cbrt(v[1]!), 3) / 4);
    const f = createReducingFunctions(Tc, rhoc, [{ i: 0, j: 1, betaT: 1, gammaT, betaV: 1, gammaV }]);
    for (const x1 of [0.1, 0.5, 0.6976]) {
      const r = f.evaluate([x1, 1 - x1]);
      close(r.temperature, x1 * Tc[0]! + (1 - x1) * Tc[1]! + x1 * (1 - x1) * xi, 1e-13);
      close(1 / r.density, x1 * v[0]! + (1 - x1) * v[1]! + x1 * (1 - x1) * zeta, 1e-12);
    }
  });

  it("have mole-fraction derivatives that agree with central differences", () => {
    const f = createReducingFunctions(
      [351.255, 339.173, 367.85],
      [8150.08, 4779, 4180],
      [
        pair,
        { i: 0, j: 2, betaT: 1.011011, gammaT: 0.966965, betaV: 1.007852, gammaV: 1.037663 },
        { i: 1, j: 2, betaT: 0.99, gammaT: 1.02, betaV: 1.01, gammaV: 0.99 },
      ],
    );
    const x = [0.5, 0.2, 0.3];
    const at = f.evaluate(x);
    for (let k = 0; k < 3; k++) {
      const h = 1e-6;
      const plus = [...x];
      const minus = [...x];
      plus[k]! += h;
      minus[k]! -= h;
      const dT = (f.evaluate(plus).temperature - f.evaluate(minus).temperature) / (2 * h);
      const dV = (1 / f.evaluate(plus).density - 1 / f.evaluate(minus).density) / (2 * h);
      close(at.dTemperature[k]!, dT, 1e-8);
      expect(Math.abs(at.dVolume[k]! - dV)).toBeLessThan(1e-8 * Math.abs(dV) + 1e-14);
    }
  });
});

describe.skipIf(!mixturePackPresent)(
  `departure functions and fugacities (${mixturePackPresent ? "mixture pack found" : mixturePackMissingReason})`,
  () => {
    const records = mixturePackPresent ? readDepartureFunctions() : [];

    it.each(records.map((r) => r.Name))("%s: α^r_ij matches its defining sum and its derivatives", (name) => {
      const record = records.find((r) => r.Name === name)!;
      const departure = compileDepartureFunction(record);
      const [tau, delta] = [1.15, 1.8];
      // direct evaluation of README §7.3
      let direct = 0;
      record.n.forEach((n, k) => {
        let term = n * Math.pow(delta, record.d[k]!) * Math.pow(tau, record.t[k]!);
        if (record.type === "Exponential" && record.l[k]! > 0) term *= Math.exp(-Math.pow(delta, record.l[k]!));
        if (record.type === "GERG-2008" && k >= record.Npower) {
          term *= Math.exp(
            -record.eta[k]! * (delta - record.epsilon[k]!) ** 2 - record.beta[k]! * (delta - record.gamma[k]!),
          );
        }
        direct += term;
      });
      const at = (t: number, d: number) => departure.evaluate(t, d, createResidualDerivatives());
      const centre = at(tau, delta);
      close(centre.alphar, direct, 1e-13);
      const h = 1e-5;
      close(centre.dDelta, (at(tau, delta + h).alphar - at(tau, delta - h).alphar) / (2 * h), 1e-7);
      close(centre.dTau, (at(tau + h, delta).alphar - at(tau - h, delta).alphar) / (2 * h), 1e-7);
      close(centre.dDelta2, (at(tau, delta + h).dDelta - at(tau, delta - h).dDelta) / (2 * h), 1e-6);
      close(centre.dDeltaTau, (at(tau + h, delta).dDelta - at(tau - h, delta).dDelta) / (2 * h), 1e-6);
    });

    it("turns a GERG-2008 exponential term into a δ-Gaussian exactly (completing the square)", () => {
      const record = {
        Name: "synthetic",
        BibTeX: "-",
        type: "GERG-2008" as const,
        Npower: 1,
        n: [0.5, -0.3],
        t: [1.2, 0.7],
        d: [1, 2],
        eta: [0, 1.1],
        epsilon: [0, 0.6],
        beta: [0, 0.4],
        gamma: [0, 0.5],
      };
      const [tau, delta] = [0.9, 1.4];
      const expected =
        0.5 * delta * Math.pow(tau, 1.2) +
        -0.3 * delta * delta * Math.pow(tau, 0.7) * Math.exp(-1.1 * (delta - 0.6) ** 2 - 0.4 * (delta - 0.5));
      close(compileDepartureFunction(record).evaluate(tau, delta).alphar, expected, 1e-14);
    });

    it("every pair of the 15 blends exists in binary_pairs.json (README §7.5)", () => {
      const pairs = readBinaryPairs();
      expect(pairs.length).toBe(47);
      for (const id of ["R448A", "R455A", "R466A", "R404A"]) expect(blendModel(id).pairs.length).toBeGreaterThan(0);
    });

    it("with x = (1, 0) the mixture residual equals the pure component's (pure-fluid limit)", () => {
      const blend = blendModel("R454B");
      const pure = createFluidModel(readReferenceFluid("R32")).eos;
      const [T, rho] = [280, 20_000];
      const mixture = blend.model.residual(T, rho, [1, 0]);
      const direct = pure.residual.evaluate(pure.reducingTemperature / T, rho / pure.reducingDensity);
      close(mixture.alphar, direct.alphar, 1e-14);
      close(mixture.dDelta, direct.dDelta, 1e-14);
      close(mixture.dTau, direct.dTau, 1e-14);
      // ln φ of a pure fluid: α^r + δα^r_δ − ln(1 + δα^r_δ)
      const phase = blend.model.phase(T, rho, [1, 0]);
      const delta = rho / pure.reducingDensity;
      close(
        phase.lnFugacityCoefficient[0]!,
        direct.alphar + delta * direct.dDelta - Math.log(1 + delta * direct.dDelta),
        1e-12,
      );
    });

    it("bubble pressure of an almost pure blend equals the component's superancillary vapour pressure", () => {
      const blend = blendModel("R454B");
      const z = Float64Array.from([1 - 1e-10, 1e-10]);
      const T = 260;
      const point = solveEnvelopePoint(
        blend.model,
        z,
        "bubble",
        { temperature: T },
        coldStart(blend.model, z, "bubble", T),
      );
      const component = blend.model.components[0]!;
      // x_2 = 1e-10 moves p by about 1e-10 relative (Henry's law). The mixture uses
      // R = 8.31446261815324 J/(mol·K) (README §7.3), R32's EOS its own R: p scales with R.
      const expected = component.superancillary!.pressure(T) * (blend.model.gasConstant / component.gasConstant);
      close(point.p / expected, 1, 1e-8);
    });

    // ln φ_i from ∂(nα^r)/∂n_i (README §7.4) against central differences of n·α^r(T, n/V, n/Σn)
    it.each(["R448A", "R455A", "R466A", "R404A", "R513A"])(
      "%s: ∂(nα^r)/∂n_i agrees with numerical differentiation of the total Helmholtz energy",
      (id) => {
        const blend = blendModel(id);
        const z = Array.from(blend.moleFractions);
        const bubble = solveEnvelopePoint(
          blend.model,
          blend.moleFractions,
          "bubble",
          { temperature: 260 },
          coldStart(blend.model, blend.moleFractions, "bubble", 260),
        );
        for (const [T, rho] of [
          [260, 1.02 * bubble.bulkDensity], // compressed liquid
          [300, 400], // vapour
          [400, 5_000], // supercritical, near the critical density
        ] as const) {
          const volume = 1 / rho; // for n = 1 mol
          const total = (moles: number[]) => {
            const n = moles.reduce((a, b) => a + b, 0);
            return (
              n *
              blend.model.residual(
                T,
                n / volume,
                moles.map((m) => m / n),
              ).alphar
            );
          };
          const phase = blend.model.phase(T, rho, z);
          let gibbs = 0;
          z.forEach((_, i) => {
            // five-point central difference in n_i (truncation ~h⁴)
            const h = 1e-4;
            const shifted = (by: number) => total(z.map((value, k) => (k === i ? value + by : value)));
            const numerical = (-shifted(2 * h) + 8 * shifted(h) - 8 * shifted(-h) + shifted(-2 * h)) / (12 * h);
            expect(Math.abs(phase.residualChemicalPotential[i]! - numerical)).toBeLessThan(1e-10);
            gibbs += z[i]! * phase.lnFugacityCoefficient[i]!;
          });
          // Σ x_i ln φ_i = g^r/RT = α^r + Z − 1 − ln Z
          const r = blend.model.residual(T, rho, z);
          close(gibbs, r.alphar + phase.Z - 1 - Math.log(phase.Z), 1e-12);
        }
      },
    );
  },
);

describe("solveLinearSystem", () => {
  it("solves a small system with pivoting", () => {
    const x = solveLinearSystem(
      [
        [0, 2, 1],
        [1, 1, 0],
        [3, 0, 1],
      ],
      [5, 3, 6],
    );
    // hand solution: x = (1, 2, 3)… check A·x = b
    expect(x[0]! * 0 + x[1]! * 2 + x[2]!).toBeCloseTo(5, 12);
    expect(x[0]! + x[1]!).toBeCloseTo(3, 12);
    expect(3 * x[0]! + x[2]!).toBeCloseTo(6, 12);
  });
});
