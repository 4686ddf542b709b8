/**
 * The demo's sites, specs and seasonal crews (all invented). Spec rates follow the usual one-pass
 * hydroseeding figures the load card starts from (WSDOE BMP C120/C121: 1,500 lb/ac wood fiber,
 * seed and fertilizer at their spec) and heavier mulch for steep cuts; each company's list has one
 * site that is hard on rigs, so the board by job has something to find.
 */
import type { JobMaterial } from "../app/lib/jobs/schema";
import type { CompanySlug } from "./demo-fleet";

export const SPECS: Record<string, { materials: JobMaterial[]; passes: number; waterGalPerAcre: number | null }> = {
  seeding: {
    passes: 1,
    waterGalPerAcre: null,
    materials: [
      { name: "Wood fiber mulch", lbPerAcre: 1500, kind: "fiber", bagLb: 50 },
      { name: "Native seed mix", lbPerAcre: 60, kind: "seed", bagLb: 25 },
      { name: "Fertilizer 16-16-16", lbPerAcre: 200, kind: "fertilizer", bagLb: 50 },
    ],
  },
  slope: {
    passes: 2,
    waterGalPerAcre: null,
    materials: [
      { name: "Wood fiber mulch", lbPerAcre: 2000, kind: "fiber", bagLb: 50 },
      { name: "Slope seed mix", lbPerAcre: 80, kind: "seed", bagLb: 25 },
      { name: "Guar tackifier", lbPerAcre: 60, kind: "tackifier", bagLb: 50 },
    ],
  },
  mulch: {
    passes: 1,
    // 2,500 lb of fiber at the usual 50 lb per 100 gal ceiling needs 5,000 gal an acre.
    waterGalPerAcre: 5000,
    materials: [
      { name: "Wood fiber mulch", lbPerAcre: 2500, kind: "fiber", bagLb: 50 },
      { name: "Guar tackifier", lbPerAcre: 80, kind: "tackifier", bagLb: 50 },
    ],
  },
  lawn: {
    passes: 1,
    waterGalPerAcre: null,
    materials: [
      { name: "Paper-wood blend mulch", lbPerAcre: 1200, kind: "fiber", bagLb: 50 },
      { name: "Turf seed", lbPerAcre: 200, kind: "seed", bagLb: 50 },
      { name: "Starter fertilizer", lbPerAcre: 250, kind: "fertilizer", bagLb: 50 },
      { name: "Green dye", lbPerAcre: 5, kind: "other", bagLb: null },
    ],
  },
};

export interface DemoSite {
  name: string;
  customer: string;
  address: string;
  elevationFt: number;
  spec: keyof typeof SPECS;
  /** Hard on rigs: faults there come this many times as often, with these ends (invented). */
  hard?: { factor: number; ends: [string, string][] };
}

export const SITES: Record<CompanySlug, DemoSite[]> = {
  "cedar-flats": [
    { name: "Alder Bend subdivision lots", customer: "Alder Bend Homes", address: "Alder Bend Rd, lots 14–40", elevationFt: 2780, spec: "lawn" },
    { name: "Route 9 widening cut slopes", customer: "State DOT District 3", address: "Route 9, mile 22–24", elevationFt: 3310, spec: "slope" },
    { name: "Millpond dam face", customer: "Millpond Irrigation District", address: "Millpond Reservoir, east embankment", elevationFt: 3040, spec: "slope" },
    {
      name: "Basalt Ridge quarry reclamation",
      customer: "Basalt Ridge Aggregates",
      address: "Quarry Rd, upper benches",
      elevationFt: 5350,
      spec: "mulch",
      // Crushed-rock fines in the mulch water, 400 ft hose runs up the benches (invented).
      hard: {
        factor: 3.2,
        ends: [
          ["excessive-wear", "handoff-wear"],
          ["excessive-wear", "fixed-worn-tip"],
          ["short-throw", "fixed-hose"],
          ["plugging", "fixed-nozzle"],
        ],
      },
    },
    { name: "Cedar Creek pipeline corridor", customer: "Northfork Gas", address: "ROW markers 12–31", elevationFt: 3640, spec: "seeding" },
    { name: "Harmon school playing fields", customer: "Harmon School District", address: "Harmon Middle School", elevationFt: 2850, spec: "lawn" },
    { name: "Oak Hollow solar farm", customer: "Brightline Solar", address: "Oak Hollow Rd", elevationFt: 3120, spec: "seeding" },
    { name: "County Road 8 ditches", customer: "Larch County Roads", address: "CR 8, mile 3–9", elevationFt: 2960, spec: "seeding" },
    { name: "Riverside park restoration", customer: "City of Cedar Flats", address: "Riverside Park, north bank", elevationFt: 2700, spec: "mulch" },
    { name: "Falcon Heights hillside", customer: "Falcon Heights HOA", address: "Falcon Heights Dr", elevationFt: 3920, spec: "slope" },
    { name: "Landfill cap, cell 4", customer: "Larch County Solid Waste", address: "Landfill Rd, cell 4", elevationFt: 3230, spec: "seeding" },
    { name: "Kestrel logistics pad", customer: "Kestrel Freight", address: "Industrial Way 220", elevationFt: 2810, spec: "lawn" },
    { name: "Burn scar, Dry Fork", customer: "US Forest Service", address: "Dry Fork drainage, units 2–5", elevationFt: 4780, spec: "mulch" },
    { name: "Spring Valley wetland buffer", customer: "Spring Valley Conservancy", address: "Spring Valley Rd", elevationFt: 2740, spec: "seeding" },
  ],
  "blue-mesa": [
    { name: "Juniper Draw subdivision", customer: "Juniper Draw Builders", address: "Juniper Draw, phase 2", elevationFt: 6240, spec: "seeding" },
    { name: "Highway 160 shoulders", customer: "State DOT Region 5", address: "Hwy 160, mile 88–95", elevationFt: 7010, spec: "slope" },
    {
      name: "Kettle Pass trailhead",
      customer: "Mesa County Parks",
      address: "Kettle Pass Rd, end of pavement",
      elevationFt: 8920,
      spec: "mulch",
      // Thin air and a creek 12 ft below the pump: the suction lift is near the limit (invented).
      hard: {
        factor: 3,
        ends: [
          ["lost-prime", "fixed-lift"],
          ["lost-prime", "handoff-lift"],
          ["foaming", "fixed-air-bound"],
        ],
      },
    },
    { name: "Mesa Verde Estates", customer: "Red Rock Homes", address: "Mesa Verde Estates, lots 1–22", elevationFt: 5980, spec: "lawn" },
    { name: "Sandstone wash channel", customer: "Mesa County Flood Control", address: "Sandstone Wash, reach 3", elevationFt: 5720, spec: "slope" },
    { name: "Pinon Ridge well pads", customer: "Pinon Energy", address: "Pads 7, 9 and 12", elevationFt: 6650, spec: "seeding" },
    { name: "Airport runway apron", customer: "Mesa Regional Airport", address: "Runway 3/21 infield", elevationFt: 5810, spec: "seeding" },
    { name: "Canyon Rim switchbacks", customer: "BLM Field Office", address: "Canyon Rim Rd", elevationFt: 7480, spec: "mulch" },
  ],
};

/** Crew who came and went over the two seasons (the demo's sign-ins stay all along). */
export interface SeasonalPerson {
  email: string;
  name: string;
  company: CompanySlug;
  /** First and last day worked, as month offsets from the first season's January (0 = January of the first season). */
  fromMonth: number;
  toMonth: number | null;
  weight: number;
  /** Reads Tankside in Spanish (invented: two of the hands who stayed, so the demo shows both languages). */
  language?: "es";
}

export const SEASONAL_CREW: SeasonalPerson[] = [
  { email: "jesse@cedarflats.example", name: "Jesse Marsh", company: "cedar-flats", fromMonth: 2, toMonth: 10, weight: 6 },
  { email: "hollis@cedarflats.example", name: "Hollis Grant", company: "cedar-flats", fromMonth: 2, toMonth: null, weight: 6 },
  { email: "carlos@cedarflats.example", name: "Carlos Ybarra", company: "cedar-flats", fromMonth: 7, toMonth: null, weight: 5, language: "es" },
  { email: "priya@cedarflats.example", name: "Priya Nandakumar", company: "cedar-flats", fromMonth: 15, toMonth: null, weight: 6 },
  { email: "bo@cedarflats.example", name: "Bo Lindqvist", company: "cedar-flats", fromMonth: 2, toMonth: null, weight: 6 },
  { email: "ana@cedarflats.example", name: "Ana Ruelas", company: "cedar-flats", fromMonth: 2, toMonth: 10, weight: 5 },
  { email: "tess@cedarflats.example", name: "Tess Okonkwo", company: "cedar-flats", fromMonth: 3, toMonth: null, weight: 5 },
  { email: "marcus@cedarflats.example", name: "Marcus Webb", company: "cedar-flats", fromMonth: 14, toMonth: 22, weight: 5 },
  { email: "eli@cedarflats.example", name: "Eli Navarro", company: "cedar-flats", fromMonth: 15, toMonth: null, weight: 5 },
  { email: "wren@bluemesa.example", name: "Wren Castillo", company: "blue-mesa", fromMonth: 3, toMonth: 9, weight: 5 },
  { email: "rosa@bluemesa.example", name: "Rosa Tsosie", company: "blue-mesa", fromMonth: 3, toMonth: null, weight: 5 },
  { email: "kit@bluemesa.example", name: "Kit Larsen", company: "blue-mesa", fromMonth: 15, toMonth: 21, weight: 4 },
  { email: "joaquin@bluemesa.example", name: "Joaquin Baca", company: "blue-mesa", fromMonth: 15, toMonth: null, weight: 5, language: "es" },
];

/** The demo sign-ins' share of the field work (supervisors and trainers fill in now and then). */
export const SIGN_IN_WEIGHTS: Record<string, number> = {
  "dana@cedarflats.example": 8,
  "ravi@cedarflats.example": 2,
  "mo@cedarflats.example": 1,
  "sam@bluemesa.example": 8,
  "li@bluemesa.example": 1,
};
