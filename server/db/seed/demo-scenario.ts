/**
 * The invented demo world of PRODUCT.md: Bellbird Mechanical, a small service company,
 * and the Wattle Lane Clinic it maintains. Every name and figure here is made up.
 */
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { Application } from "@shared/schemas/diagnosis.ts";
import type { CylinderKind } from "@shared/schemas/register.ts";
import type { Role } from "../schema.ts";

export const DEMO_PASSWORD = "bellbird-demo-2026";

export const demoOrganisation = { name: "Bellbird Mechanical" };

export const demoPeople = [
  { email: "owner@bellbird.example", name: "Dana Whitlock", role: "owner" },
  { email: "senior@bellbird.example", name: "Priya Raman", role: "senior" },
  { email: "tech@bellbird.example", name: "Sam Toko", role: "technician" },
  { email: "tech2@bellbird.example", name: "Lee Hargreaves", role: "technician" },
  { email: "apprentice@bellbird.example", name: "Jordan Vu", role: "apprentice" },
] as const satisfies readonly { email: string; name: string; role: Role }[];
/** A demo person's e-mail: the key the tests look the demo people up by. */
export type DemoEmail = (typeof demoPeople)[number]["email"];

export const demoCustomer = {
  name: "Wattle Lane Clinic",
  contactName: "Robin Ashby (practice manager)",
  contactEmail: "facilities@wattlelane.example",
  contactPhone: "03 5550 0142",
};

export const demoSite = {
  name: "Wattle Lane Clinic — main building",
  address: "14 Wattle Lane, Bellbird Creek",
  altitudeM: 85,
};

export interface DemoEquipment {
  name: string;
  kind: string;
  application: Application;
  location: string;
  maker: string;
  model: string;
  serial: string;
  refrigerant: string;
  circuits: CircuitNameplate[];
  compressorRlaA: number;
  compressorLraA: number;
  fanFlaA: number;
  supplyVoltageV: number;
  phases: number;
  ratedHighSideKPa: number;
  ratedLowSideKPa: number;
}

export const demoEquipment: DemoEquipment[] = [
  {
    name: "RTU-1 packaged rooftop unit",
    kind: "packaged rooftop",
    application: "comfort-cooling",
    location: "Roof, above the waiting room",
    maker: "Southerly Air",
    model: "SPR-150-2C",
    serial: "SA21-44817",
    refrigerant: "R407C",
    circuits: [
      {
        number: 1,
        factoryChargeKg: 4.2,
        meteringDevice: "txv",
        targetSuperheatK: 6,
        targetSubcoolingK: 5,
        liquidLineLengthM: null,
      },
      {
        number: 2,
        factoryChargeKg: 4.2,
        meteringDevice: "txv",
        targetSuperheatK: 6,
        targetSubcoolingK: 5,
        liquidLineLengthM: null,
      },
    ],
    compressorRlaA: 11.8,
    compressorLraA: 74,
    fanFlaA: 2.1,
    supplyVoltageV: 400,
    phases: 3,
    ratedHighSideKPa: 2900,
    ratedLowSideKPa: 1700,
  },
  {
    name: "Server cupboard wall split",
    kind: "wall split",
    application: "comfort-cooling",
    location: "Level 1, comms cupboard",
    maker: "Kestrel",
    model: "KW-35R32",
    serial: "KW3522-0931",
    refrigerant: "R32",
    circuits: [
      {
        number: 1,
        factoryChargeKg: 0.85,
        meteringDevice: "eev",
        targetSuperheatK: null,
        targetSubcoolingK: null,
        liquidLineLengthM: 6,
      },
    ],
    compressorRlaA: 6.4,
    compressorLraA: 28,
    fanFlaA: 0.4,
    supplyVoltageV: 230,
    phases: 1,
    ratedHighSideKPa: 4150,
    ratedLowSideKPa: 2500,
  },
  {
    name: "Vaccine and stores cool room",
    kind: "cool room",
    application: "medium-temperature-refrigeration",
    location: "Ground floor, rear store",
    maker: "Polar Bay",
    model: "PB-CR2",
    serial: "PB19-2260",
    refrigerant: "R404A",
    circuits: [
      {
        number: 1,
        factoryChargeKg: 2.6,
        meteringDevice: "txv",
        targetSuperheatK: 5.5,
        targetSubcoolingK: 4,
        liquidLineLengthM: 9,
      },
    ],
    compressorRlaA: 7.9,
    compressorLraA: 46,
    fanFlaA: 0.9,
    supplyVoltageV: 230,
    phases: 1,
    ratedHighSideKPa: 2800,
    ratedLowSideKPa: 1600,
  },
];

/**
 * Bellbird's R407C cylinders for the rooftop unit (invented). The recovery cylinder already
 * holds refrigerant from an earlier job, entered as its contents on the day it was added;
 * the register itself starts empty.
 */
export const demoCylinders: {
  label: string;
  serial: string;
  kind: CylinderKind;
  refrigerant: string;
  waterCapacityKg: number;
  tareKg: number;
  initialContentsKg: number;
}[] = [
  {
    label: "BM-REC-07",
    serial: "RC12-30871",
    kind: "recovery",
    refrigerant: "R407C",
    waterCapacityKg: 12,
    tareKg: 7.4,
    initialContentsKg: 5.2,
  },
  {
    label: "BM-407C-N3",
    serial: "NX10-55214",
    kind: "new",
    refrigerant: "R407C",
    waterCapacityKg: 15,
    tareKg: 6.1,
    initialContentsKg: 10,
  },
];
