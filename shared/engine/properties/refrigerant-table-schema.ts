/**
 * zod schema of a generated refrigerant table (data/refrigerants/<id>.json).
 *
 * Tables are written by scripts/build-tables.ts from published Helmholtz equations
 * of state and checked with this schema when the engine first uses them, so a
 * bad file fails loudly in tests instead of giving wrong pressures.
 * Columns are stored column-wise (one array per quantity) to keep files small.
 */
import { z } from "zod";

const finite = z.number().refine(Number.isFinite, "must be a finite number");
const positive = finite.refine((value) => value > 0, "must be positive");

const GwpEntrySchema = z.object({
  value: finite,
  display: z.string(),
  fromMemory: z.boolean(),
  note: z.string().optional(),
});

export const TABLE_COLUMNS = [
  "temperature",
  "bubblePressure",
  "dewPressure",
  "bubbleSlope",
  "dewSlope",
  "liquidDensity",
  "vapourDensity",
  "liquidEnthalpy",
  "vapourEnthalpy",
] as const;

export type TableColumn = (typeof TABLE_COLUMNS)[number];

export const RefrigerantTableSchema = z
  .object({
    id: z.string().min(2),
    name: z.string(),
    kind: z.enum(["pure", "blend"]),
    composition: z.string().optional(),
    safety: z.object({
      class: z.enum(["A1", "A2L", "A2", "A3", "B1", "B2L", "B2", "B3"]),
      standard: z.string(),
      fromMemory: z.boolean(),
    }),
    gwp100: z.object({
      AR4: GwpEntrySchema.nullable(),
      AR5: GwpEntrySchema.nullable(),
      source: z.string(),
    }),
    criticalPoint: z.object({
      temperatureC: finite,
      pressureKPa: positive,
      densityKgPerM3: positive,
      note: z.string(),
    }),
    /** null when the triple-point pressure is above one atmosphere (R744) */
    normalBoilingPoint: z.object({ bubbleC: finite, dewC: finite }).nullable(),
    /** blends only: glide at the dew pressure of 0 °C */
    glideAt0C: z
      .object({ pressureKPa: positive, bubbleC: finite, dewC: finite, glideK: finite, definition: z.string() })
      .nullable(),
    referenceState: z.string(),
    source: z.object({
      /**
       * How the saturation rows were computed: one pure-fluid EOS, a pseudo-pure blend EOS with
       * published bubble/dew equations, or the multi-fluid mixture model (equal fugacities).
       */
      model: z.enum(["pure-fluid", "pseudo-pure", "multi-fluid"]).optional(),
      equationOfState: z.string(),
      bibtexKeys: z.array(z.string()).min(1),
      data: z.string(),
      licence: z.string(),
      method: z.string(),
    }),
    generated: z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
    validRange: z.object({ minimumC: finite, maximumC: finite, lowerLimit: z.string() }),
    interpolation: z.string(),
    units: z.record(z.enum(TABLE_COLUMNS), z.string()),
    columns: z.object(
      Object.fromEntries(TABLE_COLUMNS.map((name) => [name, z.array(finite).min(2)])) as Record<
        TableColumn,
        z.ZodArray<typeof finite>
      >,
    ),
  })
  .superRefine((table, context) => {
    const { columns } = table;
    const length = columns.temperature.length;
    for (const name of TABLE_COLUMNS) {
      if (columns[name].length !== length) {
        context.addIssue({
          code: "custom",
          message: `column ${name} has ${columns[name].length} rows, temperature has ${length}`,
          path: ["columns", name],
        });
      }
    }
    // Strictly increasing axes: temperature and both pressures (saturation curves rise with T).
    for (const name of ["temperature", "bubblePressure", "dewPressure"] as const) {
      const values = columns[name];
      const row = values.findIndex((value, index) => {
        const before = values[index - 1];
        return before !== undefined && !(value > before);
      });
      if (row !== -1) {
        context.addIssue({
          code: "custom",
          message: `column ${name} is not strictly increasing at row ${row}`,
          path: ["columns", name],
        });
      }
    }
    for (const name of [
      "bubblePressure",
      "dewPressure",
      "bubbleSlope",
      "dewSlope",
      "liquidDensity",
      "vapourDensity",
    ] as const) {
      if (columns[name].some((value) => !(value > 0))) {
        context.addIssue({ code: "custom", message: `column ${name} must be positive`, path: ["columns", name] });
      }
    }
    if (
      columns.temperature[0] !== table.validRange.minimumC ||
      columns.temperature[length - 1] !== table.validRange.maximumC
    ) {
      context.addIssue({
        code: "custom",
        message: "validRange must match the first and last temperature rows",
        path: ["validRange"],
      });
    }
  });

export type RefrigerantTable = z.infer<typeof RefrigerantTableSchema>;
