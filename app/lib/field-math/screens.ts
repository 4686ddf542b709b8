/** The field-math screens, in the order crews reach for them. */
export const FIELD_MATH_SCREENS = [
  { id: "load", title: "Load sheet", lead: "Tank loads, water, bags and area per load for a job." },
  { id: "hose", title: "Hose and reach", lead: "What a hose run costs in pressure and reach." },
  { id: "suction", title: "Suction head", lead: "Will the pump hold prime drafting from a pond or ditch?" },
  { id: "torque", title: "Torque", lead: "ft·lb and N·m, and this rig's figures." },
] as const;

export type FieldMathScreenId = (typeof FIELD_MATH_SCREENS)[number]["id"];
export const fieldMathScreen = (id: string) => FIELD_MATH_SCREENS.find((t) => t.id === id);
