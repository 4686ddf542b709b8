/** The field-math screens, in the order crews reach for them. */
export const FIELD_MATH_SCREENS = [
  { id: "load", title: "Load card", lead: "Each load at the tank: water marks, whole bags, order, weight, the strip it covers, the seed clock." },
  { id: "tip", title: "Tip for the slope", lead: "Which of the rig's tips, how many passes and from where, with the hose in use." },
  { id: "hose", title: "Hose and reach", lead: "What a hose run costs in pressure and reach." },
  { id: "suction", title: "Suction head", lead: "Will the pump hold prime drafting from a pond or ditch?" },
  { id: "torque", title: "Torque", lead: "ft·lb and N·m, and this rig's figures." },
  { id: "rate", title: "Rate applied", lead: "After spraying a measured area: the lb/ac actually put down against the spec." },
] as const;

export type FieldMathScreenId = (typeof FIELD_MATH_SCREENS)[number]["id"];
export const fieldMathScreen = (id: string) => FIELD_MATH_SCREENS.find((t) => t.id === id);
