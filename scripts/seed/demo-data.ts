import type { ProjectStatus, Role } from "@/db/schema";

/**
 * The demo's invented scenario: two trim contractors in the fictional river town of Alder Bend.
 * Every name, company and address here is made up.
 */
export const DEMO_PASSWORD = "miterwise-demo";

export const demoPeople = [
  { key: "admin", name: "Rosa Quillfeather", email: "rosa@birchmoor.example" },
  { key: "estimator", name: "Tomas Ferrow", email: "tomas@birchmoor.example" },
  { key: "pm", name: "Ines Calder", email: "ines@birchmoor.example" },
  { key: "otherAdmin", name: "Dale Pembry", email: "dale@quarrylane.example" },
] as const;

type PersonKey = (typeof demoPeople)[number]["key"];

export const demoOrgs: {
  name: string;
  owner: PersonKey;
  members: { person: PersonKey; role: Role }[];
  projects: { name: string; generalContractor: string; bidDue: string; status: ProjectStatus }[];
}[] = [
  {
    name: "Birchmoor Finish Carpentry",
    owner: "admin",
    members: [
      { person: "estimator", role: "estimator" },
      { person: "pm", role: "project_manager" },
    ],
    projects: [
      { name: "Larkspur Commons — Building C", generalContractor: "Fenwick & Hale Builders", bidDue: "2027-02-12", status: "draft" },
      { name: "Otter Creek Townhomes", generalContractor: "Greywater Construction", bidDue: "2027-01-20", status: "draft" },
      { name: "Millrace Senior Residences", generalContractor: "Fenwick & Hale Builders", bidDue: "2026-10-30", status: "draft" },
    ],
  },
  {
    // A second company that shares one person with the first, to show switching organisations.
    name: "Quarry Lane Trim Co.",
    owner: "otherAdmin",
    members: [{ person: "pm", role: "estimator" }],
    projects: [{ name: "Heronfield Library Annex", generalContractor: "Stonecrop Builders", bidDue: "2027-03-05", status: "draft" }],
  },
];

export const roleOfLogin: Record<PersonKey, string> = {
  admin: "admin of Birchmoor",
  estimator: "estimator at Birchmoor",
  pm: "project manager at Birchmoor, estimator at Quarry Lane",
  otherAdmin: "admin of Quarry Lane",
};
