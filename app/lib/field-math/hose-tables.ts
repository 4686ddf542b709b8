/**
 * Fire-service friction-loss coefficients C for FL = C·Q²·L (FL psi, Q hundreds of gpm,
 * L hundreds of feet), by hose inside diameter in inches. Published tables differ, so each
 * is kept whole with its source and the user sees which one a figure used.
 */
export interface FrictionTable {
  id: string;
  name: string;
  source: string;
  coefficients: Record<string, number>;
}

export const FRICTION_TABLES: FrictionTable[] = [
  {
    id: "rohnert-park",
    name: "Rohnert Park fire training",
    source: 'City of Rohnert Park fire training, "3-8 Calculating Friction Loss in Hose Lays"',
    coefficients: { "1": 150, "1.5": 24, "1.75": 10, "2.5": 2, "3": 0.8, "4": 0.2, "5": 0.08 },
  },
  {
    id: "ifsta",
    name: "IFSTA (as quoted in fire training material)",
    source: "IFSTA friction-loss coefficient table, as quoted in fire training material",
    coefficients: { "1.75": 15.5, "2": 8 },
  },
];

export const tableById = (id: string) => FRICTION_TABLES.find((t) => t.id === id);

/**
 * The rigid-pipe formula offered beside the tables, and used for a hose size no table lists (1¼ in):
 * Hazen-Williams, US units, hf (ft of water per 100 ft) = 0.2083·(100/C)^1.852·q^1.852 / d^4.8655.
 */
export const HAZEN_WILLIAMS = {
  id: "hazen-williams",
  name: "Rigid-pipe formula (Hazen-Williams)",
  source: "Hazen-Williams formula for water in full pipe, US units (hf = 0.2083·(100/C)^1.852·q^1.852/d^4.8655)",
  /** Smooth rubber-lined hose (from memory; confirm C for a hose from its maker). */
  defaultC: 140,
} as const;

/** Every way the friction of a hose run can be worked out: the tables, then the formula. */
export const FRICTION_METHODS: [string, ...string[]] = [HAZEN_WILLIAMS.id, ...FRICTION_TABLES.map((t) => t.id)];

/** The first table with a coefficient for this diameter, preferring the one asked for. */
export function tableFor(diameterIn: number, preferred?: string): FrictionTable | undefined {
  const has = (t: FrictionTable) => String(diameterIn) in t.coefficients;
  const wanted = preferred ? tableById(preferred) : undefined;
  if (wanted && has(wanted)) return wanted;
  return FRICTION_TABLES.find(has);
}
