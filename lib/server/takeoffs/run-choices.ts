import { listRunChoices } from "@/db/queries/run-choices";

/** What the run form offers: the organisation's price books and casings, never their prices. */
export const runChoices = (orgId: string) => listRunChoices(orgId);
