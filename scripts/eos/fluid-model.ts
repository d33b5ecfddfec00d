/**
 * A refrigerant as the generator sees it: its Helmholtz EOS (IIR reference
 * applied), its saturation curve source (superancillary + phase equilibrium for
 * pure fluids; published bubble/dew equations for pseudo-pure blends), and the
 * ancillaries used as starting guesses.
 */
import { createAncillary, type AncillaryCurve } from "./ancillary.ts";
import { createHelmholtzEos, type HelmholtzEos } from "./helmholtz-eos.ts";
import { createSuperancillary, type SuperancillaryCurve } from "./superancillary.ts";
import type { ReferenceFluidFile } from "./reference-types.ts";

export interface FluidModel {
  readonly designation: string;
  readonly kind: "pure" | "pseudo-pure";
  readonly file: ReferenceFluidFile;
  readonly eos: HelmholtzEos;
  /** pure fluids only */
  readonly superancillary: SuperancillaryCurve | null;
  /** pure: pS; pseudo-pure: pL (bubble) */
  readonly bubblePressureCurve: AncillaryCurve;
  /** pure: pS; pseudo-pure: pV (dew) */
  readonly dewPressureCurve: AncillaryCurve;
  readonly liquidDensityCurve: AncillaryCurve;
  readonly vapourDensityCurve: AncillaryCurve;
  /** lowest saturation temperature of the EOS in K (triple point, or 200 K limit for the blends) */
  readonly minimumTemperature: number;
  /** end of the saturation curve in K (EOS critical point; T_r of the pL/pV equations for blends) */
  readonly criticalTemperature: number;
}

/**
 * @param file a parsed reference fluid file
 * @returns the fluid model, without the IIR reference shift (see applyIirReference)
 * @throws Error when a pure fluid lacks its superancillary or vapour-pressure ancillary
 * @example createFluidModel(readReferenceFluid("R32")).criticalTemperature // 351.255 K
 */
export function createFluidModel(file: ReferenceFluidFile): FluidModel {
  const eos = createHelmholtzEos(file);
  const kind = file.EOS[0].pseudo_pure ? "pseudo-pure" : "pure";
  const anc = file.ANCILLARIES;
  if (kind === "pure") {
    const sa = file.EOS[0].SUPERANCILLARY;
    if (!sa || !anc.pS) throw new Error(`${file.designation}: pure fluid without superancillary or pS ancillary`);
    const superancillary = createSuperancillary(sa);
    const pS = createAncillary(anc.pS);
    return {
      designation: file.designation,
      kind,
      file,
      eos,
      superancillary,
      bubblePressureCurve: pS,
      dewPressureCurve: pS,
      liquidDensityCurve: createAncillary(anc.rhoL),
      vapourDensityCurve: createAncillary(anc.rhoV),
      minimumTemperature: superancillary.minimumTemperature,
      criticalTemperature: superancillary.criticalTemperature,
    };
  }
  if (!anc.pL || !anc.pV) throw new Error(`${file.designation}: pseudo-pure blend without pL/pV equations`);
  const pL = createAncillary(anc.pL);
  return {
    designation: file.designation,
    kind,
    file,
    eos,
    superancillary: null,
    bubblePressureCurve: pL,
    dewPressureCurve: createAncillary(anc.pV),
    liquidDensityCurve: createAncillary(anc.rhoL),
    vapourDensityCurve: createAncillary(anc.rhoV),
    minimumTemperature: pL.minimumTemperature,
    criticalTemperature: pL.reducingTemperature,
  };
}
