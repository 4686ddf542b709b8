/** The field-math screens, in the order crews reach for them. */
export const TOOLS = [
  { id: "load", title: "Load sheet", lead: "Tank loads, water, bags and area per load for a job." },
  { id: "hose", title: "Hose and reach", lead: "What a hose run costs in pressure and reach." },
  { id: "suction", title: "Suction head", lead: "Will the pump hold prime drafting from a pond or ditch?" },
  { id: "torque", title: "Torque", lead: "ft·lb and N·m, and this rig's figures." },
] as const;

export type ToolId = (typeof TOOLS)[number]["id"];
export const toolById = (id: string) => TOOLS.find((t) => t.id === id);
