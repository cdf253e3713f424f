/**
 * Pipe dimensions and Hazen-Williams C-factors per material and nominal size.
 *
 * Copper (ASTM B88) and steel (ASME B36.10M) tables give a nominal wall, so their bore is
 * ID = OD − 2 × wall, the published ID. Plastic pipe (ASTM F442 CPVC, ASTM F876 PEX) is specified by
 * its MINIMUM wall with a plus-only tolerance, so real walls run thicker and the real bore is smaller
 * than OD − 2 × minimum wall: using that figure understates friction by roughly 9–12 % at 1 in.
 * For plastic the calculators therefore use the AVERAGE bore, OD − 2 × (minimum wall + half the wall
 * tolerance), which is the figure the pipe tables publish as the average inside diameter. Where the
 * pipe's listing gives an inside diameter, the user enters it and it governs.
 */
import { HydraulicsInputError } from "./errors";

export const PIPE_MATERIALS = ["copper-k", "copper-l", "copper-m", "cpvc", "pex", "steel-40"] as const;
export type PipeMaterial = (typeof PIPE_MATERIALS)[number];

/** nominal sizes in increasing order */
export const NOMINAL_SIZES = ["1/2", "3/4", "1", "1-1/4", "1-1/2", "2"] as const;
export type NominalSize = (typeof NOMINAL_SIZES)[number];

export const isPipeMaterial = (v: unknown): v is PipeMaterial =>
  typeof v === "string" && (PIPE_MATERIALS as readonly string[]).includes(v);
export const isNominalSize = (v: unknown): v is NominalSize =>
  typeof v === "string" && (NOMINAL_SIZES as readonly string[]).includes(v);

interface OdWall {
  outsideDiameterIn: number;
  wallIn: number;
  /** plastic only: the plus-only wall tolerance, in (the average wall is wall + tolerance ÷ 2) */
  wallToleranceIn?: number;
}

export interface PipeMaterialInfo {
  key: PipeMaterial;
  label: string;
  /** the dimension standard the table comes from */
  dimensionSource: string;
  wallBasis: "nominal wall" | "minimum wall";
  /** how the bore the calculators use is found, and from what source */
  boreBasis: string;
  /** Hazen-Williams C used for new pipe of this material */
  cFactor: number;
  cFactorSource: string;
  sizes: Partial<Record<NominalSize, OdWall>>;
  note?: string;
}

/** copper tube outside diameters: 1/8 in larger than the nominal size (ASTM B88) */
const COPPER_OD: Record<NominalSize, number> = {
  "1/2": 0.625,
  "3/4": 0.875,
  "1": 1.125,
  "1-1/4": 1.375,
  "1-1/2": 1.625,
  "2": 2.125,
};

function copper(walls: Record<NominalSize, number>): Partial<Record<NominalSize, OdWall>> {
  const out: Partial<Record<NominalSize, OdWall>> = {};
  for (const size of NOMINAL_SIZES) out[size] = { outsideDiameterIn: COPPER_OD[size], wallIn: walls[size] };
  return out;
}

/** iron-pipe-size outside diameters (ASME B36.10M; ASTM F442 CPVC uses the same ODs) */
const IPS_OD: Record<NominalSize, number> = {
  "1/2": 0.84,
  "3/4": 1.05,
  "1": 1.315,
  "1-1/4": 1.66,
  "1-1/2": 1.9,
  "2": 2.375,
};

const COPPER_BORE = "published ID: OD − 2 × nominal wall (ASTM B88)";

const COPPER_C = {
  cFactor: 150,
  cFactorSource:
    "NFPA 13 Hazen-Williams C-factor table: copper tube 150 (from memory — verify against the adopted edition)",
};

export const PIPE_DATA: Record<PipeMaterial, PipeMaterialInfo> = {
  "copper-k": {
    key: "copper-k",
    label: "Copper tube, Type K",
    dimensionSource: "ASTM B88 (seamless copper water tube), Type K dimension table",
    wallBasis: "nominal wall",
    boreBasis: COPPER_BORE,
    ...COPPER_C,
    sizes: copper({ "1/2": 0.049, "3/4": 0.065, "1": 0.065, "1-1/4": 0.065, "1-1/2": 0.072, "2": 0.083 }),
  },
  "copper-l": {
    key: "copper-l",
    label: "Copper tube, Type L",
    dimensionSource: "ASTM B88 (seamless copper water tube), Type L dimension table",
    wallBasis: "nominal wall",
    boreBasis: COPPER_BORE,
    ...COPPER_C,
    sizes: copper({ "1/2": 0.04, "3/4": 0.045, "1": 0.05, "1-1/4": 0.055, "1-1/2": 0.06, "2": 0.07 }),
  },
  "copper-m": {
    key: "copper-m",
    label: "Copper tube, Type M",
    dimensionSource: "ASTM B88 (seamless copper water tube), Type M dimension table",
    wallBasis: "nominal wall",
    boreBasis: COPPER_BORE,
    ...COPPER_C,
    sizes: copper({ "1/2": 0.028, "3/4": 0.032, "1": 0.035, "1-1/4": 0.042, "1-1/2": 0.049, "2": 0.058 }),
  },
  cpvc: {
    key: "cpvc",
    label: "CPVC sprinkler pipe, SDR 13.5",
    dimensionSource:
      "ASTM F442 (CPVC pipe, SDR-PR), SDR 13.5 outside diameters and minimum walls (walls from memory; each equals OD ÷ 13.5 rounded to 0.001 in, as the SDR definition requires)",
    wallBasis: "minimum wall",
    boreBasis:
      "average bore: OD − 2 × (minimum wall + half the +0.020 in wall tolerance of ASTM F442's SDR 13.5 table; tolerance from memory — verify), e.g. 1 in → 1.101 in, smaller than OD − 2 × minimum wall (1.121 in)",
    cFactor: 150,
    cFactorSource:
      "NFPA 13 Hazen-Williams C-factor table: listed plastic pipe 150 (from memory — verify against the adopted edition)",
    sizes: {
      "3/4": { outsideDiameterIn: IPS_OD["3/4"], wallIn: 0.078, wallToleranceIn: 0.02 },
      "1": { outsideDiameterIn: IPS_OD["1"], wallIn: 0.097, wallToleranceIn: 0.02 },
      "1-1/4": { outsideDiameterIn: IPS_OD["1-1/4"], wallIn: 0.123, wallToleranceIn: 0.02 },
      "1-1/2": { outsideDiameterIn: IPS_OD["1-1/2"], wallIn: 0.141, wallToleranceIn: 0.02 },
      "2": { outsideDiameterIn: IPS_OD["2"], wallIn: 0.176, wallToleranceIn: 0.02 },
    },
    note:
      "CPVC sprinkler pipe starts at 3/4 in. The pipe maker's listed inside diameter (often a little smaller) and listed fitting equivalent lengths govern.",
  },
  pex: {
    key: "pex",
    label: "PEX tubing, SDR 9 (copper tube size)",
    dimensionSource:
      "ASTM F876 (PEX tubing; fittings systems per ASTM F877), SDR 9 copper-tube-size ODs and minimum walls (1/2–1 in matched against a published F876 dimension table; 1-1/4–2 in from memory, each equal to OD ÷ 9 rounded to 0.001 in)",
    wallBasis: "minimum wall",
    boreBasis:
      "average bore: OD − 2 × (minimum wall + half the wall tolerance of ASTM F876's SDR 9 table; tolerances from memory — verify), e.g. 1 in → 0.862 in, far below the 1 in nominal",
    cFactor: 150,
    cFactorSource:
      "NFPA 13 Hazen-Williams C-factor table: listed plastic pipe 150 (from memory — PEX listed for sprinkler use carries the maker's own C-factor and IDs; verify)",
    sizes: {
      "1/2": { outsideDiameterIn: COPPER_OD["1/2"], wallIn: 0.07, wallToleranceIn: 0.01 },
      "3/4": { outsideDiameterIn: COPPER_OD["3/4"], wallIn: 0.097, wallToleranceIn: 0.01 },
      "1": { outsideDiameterIn: COPPER_OD["1"], wallIn: 0.125, wallToleranceIn: 0.013 },
      "1-1/4": { outsideDiameterIn: COPPER_OD["1-1/4"], wallIn: 0.153, wallToleranceIn: 0.015 },
      "1-1/2": { outsideDiameterIn: COPPER_OD["1-1/2"], wallIn: 0.181, wallToleranceIn: 0.019 },
      "2": { outsideDiameterIn: COPPER_OD["2"], wallIn: 0.236, wallToleranceIn: 0.024 },
    },
    note:
      "PEX for sprinkler use must be listed for it; the maker's listed IDs, C-factor and fitting equivalent lengths govern (insert fittings narrow the bore).",
  },
  "steel-40": {
    key: "steel-40",
    label: "Steel pipe, schedule 40 (wet system)",
    dimensionSource: "ASME B36.10M (welded and seamless wrought steel pipe), schedule 40 ODs and nominal walls",
    wallBasis: "nominal wall",
    boreBasis: "published ID: OD − 2 × nominal wall (ASME B36.10M)",
    cFactor: 120,
    cFactorSource:
      "NFPA 13 Hazen-Williams C-factor table: black or galvanized steel, wet system 120 (from memory — verify against the adopted edition)",
    sizes: {
      "1/2": { outsideDiameterIn: IPS_OD["1/2"], wallIn: 0.109 },
      "3/4": { outsideDiameterIn: IPS_OD["3/4"], wallIn: 0.113 },
      "1": { outsideDiameterIn: IPS_OD["1"], wallIn: 0.133 },
      "1-1/4": { outsideDiameterIn: IPS_OD["1-1/4"], wallIn: 0.14 },
      "1-1/2": { outsideDiameterIn: IPS_OD["1-1/2"], wallIn: 0.145 },
      "2": { outsideDiameterIn: IPS_OD["2"], wallIn: 0.154 },
    },
  },
};

export interface PipeDimensions {
  material: PipeMaterial;
  nominalSize: NominalSize;
  outsideDiameterIn: number;
  wallIn: number;
  /** the bore the calculators use: the published ID (copper, steel) or the average bore (plastic) */
  insideDiameterIn: number;
  /** OD − 2 × the table's wall (for plastic, the minimum wall: the largest bore the standard allows) */
  tableWallInsideDiameterIn: number;
  wallBasis: PipeMaterialInfo["wallBasis"];
  boreBasis: string;
  source: string;
}

/** ID = OD − 2 × wall, cleaned of binary floating-point noise (tables are given to 0.001 in) */
const insideDiameter = (od: number, wall: number) => Math.round((od - 2 * wall) * 1e6) / 1e6;

export function pipeDimensions(material: unknown, nominalSize: unknown, fieldPrefix = ""): PipeDimensions {
  if (!isPipeMaterial(material)) {
    throw new HydraulicsInputError(`${fieldPrefix}material`, `must be one of ${PIPE_MATERIALS.join(", ")}`);
  }
  const info = PIPE_DATA[material];
  const row = isNominalSize(nominalSize) ? info.sizes[nominalSize] : undefined;
  if (!isNominalSize(nominalSize) || !row) {
    const offered = NOMINAL_SIZES.filter((s) => info.sizes[s]).join(", ");
    throw new HydraulicsInputError(`${fieldPrefix}nominalSize`, `for ${info.label} must be one of ${offered}`);
  }
  const tableId = insideDiameter(row.outsideDiameterIn, row.wallIn);
  const bore = row.wallToleranceIn === undefined ? tableId : insideDiameter(row.outsideDiameterIn, row.wallIn + row.wallToleranceIn / 2);
  return {
    material,
    nominalSize,
    outsideDiameterIn: row.outsideDiameterIn,
    wallIn: row.wallIn,
    insideDiameterIn: bore,
    tableWallInsideDiameterIn: tableId,
    wallBasis: info.wallBasis,
    boreBasis: info.boreBasis,
    source: info.dimensionSource,
  };
}

export const pipeInsideDiameterIn = (material: PipeMaterial, nominalSize: NominalSize): number =>
  pipeDimensions(material, nominalSize).insideDiameterIn;

export function hazenWilliamsC(material: unknown, field = "material"): number {
  if (!isPipeMaterial(material)) {
    throw new HydraulicsInputError(field, `must be one of ${PIPE_MATERIALS.join(", ")}`);
  }
  return PIPE_DATA[material].cFactor;
}

/** the nominal sizes the table holds for a material, in increasing order */
export const sizesFor = (material: PipeMaterial): NominalSize[] =>
  NOMINAL_SIZES.filter((s) => PIPE_DATA[material].sizes[s] !== undefined);
