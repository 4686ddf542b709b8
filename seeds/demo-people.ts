import type { Role } from "../app/lib/people/roles";

/** Every demo password; the demo is invented and these accounts exist only in demo data. */
export const DEMO_PASSWORD = "field-demo-2026";

export interface DemoPerson {
  email: string;
  name: string;
  role: Role;
  company: "cedar-flats" | "blue-mesa";
}

export const DEMO_PEOPLE: DemoPerson[] = [
  { email: "dana@cedarflats.example", name: "Dana Whitlock", role: "crew", company: "cedar-flats" },
  { email: "ravi@cedarflats.example", name: "Ravi Okafor", role: "trainer", company: "cedar-flats" },
  { email: "mo@cedarflats.example", name: "Mo Brennan", role: "supervisor", company: "cedar-flats" },
  { email: "june@cedarflats.example", name: "June Halvorsen", role: "admin", company: "cedar-flats" },
  { email: "li@bluemesa.example", name: "Li Serrano", role: "supervisor", company: "blue-mesa" },
  { email: "sam@bluemesa.example", name: "Sam Tafoya", role: "crew", company: "blue-mesa" },
];
