/**
 * Shapes of the published equation-of-state files in ../shared/reference/fluids
 * (CoolProp fluid-file layout; see that folder's README §2). Only the fields the
 * generator reads are typed; everything else is ignored.
 */

export interface ResidualPowerBlock {
  type: "ResidualHelmholtzPower";
  n: number[];
  d: number[];
  t: number[];
  l: number[];
}
export interface ResidualGaussianBlock {
  type: "ResidualHelmholtzGaussian";
  n: number[];
  d: number[];
  t: number[];
  eta: number[];
  epsilon: number[];
  beta: number[];
  gamma: number[];
}
export interface ResidualLemmon2005Block {
  type: "ResidualHelmholtzLemmon2005";
  n: number[];
  d: number[];
  t: number[];
  l: number[];
  m: number[];
}
export interface ResidualGaoBBlock {
  type: "ResidualHelmholtzGaoB";
  n: number[];
  d: number[];
  t: number[];
  eta: number[];
  epsilon: number[];
  beta: number[];
  gamma: number[];
  b: number[];
}
export interface ResidualNonAnalyticBlock {
  type: "ResidualHelmholtzNonAnalytic";
  n: number[];
  a: number[];
  b: number[];
  beta: number[];
  A: number[];
  B: number[];
  C: number[];
  D: number[];
}
export type ResidualBlock =
  ResidualPowerBlock | ResidualGaussianBlock | ResidualLemmon2005Block | ResidualGaoBBlock | ResidualNonAnalyticBlock;

export type IdealBlock =
  | { type: "IdealGasHelmholtzLead"; a1: number; a2: number }
  | { type: "IdealGasHelmholtzLogTau"; a: number }
  | { type: "IdealGasHelmholtzPower"; n: number[]; t: number[] }
  | { type: "IdealGasHelmholtzPlanckEinstein"; n: number[]; t: number[] }
  | { type: "IdealGasHelmholtzCP0Constant"; cp_over_R: number; Tc: number; T0: number }
  | { type: "IdealGasHelmholtzCP0PolyT"; c: number[]; t: number[]; Tc: number; T0: number }
  | { type: "IdealGasHelmholtzEnthalpyEntropyOffset"; a1: number; a2: number };

export interface PowerSeriesAncillary {
  type: string;
  n: number[];
  t: number[];
  T_r: number;
  reducing_value: number;
  using_tau_r: boolean;
  Tmin: number;
  Tmax: number;
}

export interface ChebyshevInterval {
  xmin: number;
  xmax: number;
  coef: number[];
}

export interface SuperancillaryCheckPoint {
  "T / K": number;
  "p(mp) / Pa": number;
  "rho'(mp) / mol/m^3": number;
  "rho''(mp) / mol/m^3": number;
  "p(SA)/p(mp)": number;
  "rho'(SA)/rho'(mp)": number;
  "rho''(SA)/rho''(mp)": number;
}

export interface Superancillary {
  jexpansions_p: ChebyshevInterval[];
  jexpansions_rhoL: ChebyshevInterval[];
  jexpansions_rhoV: ChebyshevInterval[];
  meta: Record<string, number>;
  check_points: SuperancillaryCheckPoint[];
}

export interface StoredState {
  T: number;
  p: number;
  rhomolar: number;
  hmolar: number;
  smolar: number;
}

export interface ReferenceFluidFile {
  designation: string;
  ANCILLARIES: {
    pS?: PowerSeriesAncillary;
    pL?: PowerSeriesAncillary;
    pV?: PowerSeriesAncillary;
    rhoL: PowerSeriesAncillary;
    rhoV: PowerSeriesAncillary;
  };
  EOS: [
    {
      BibTeX_EOS: string;
      BibTeX_CP0?: string;
      gas_constant: number;
      molar_mass: number;
      Ttriple: number;
      T_max: number;
      p_max: number;
      acentric: number;
      pseudo_pure: boolean;
      alpha0: IdealBlock[];
      alphar: ResidualBlock[];
      STATES: {
        reducing: StoredState;
        hs_anchor: StoredState;
        sat_min_liquid: StoredState;
        sat_min_vapor: StoredState;
      };
      SUPERANCILLARY?: Superancillary;
    },
  ];
  INFO: { NAME: string; CAS: string; ALIASES?: string[]; REFPROP_NAME?: string };
  STATES: { critical: StoredState; triple_liquid?: StoredState; triple_vapor?: StoredState };
}
