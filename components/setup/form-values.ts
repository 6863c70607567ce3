// What the Setup forms hold while a person types (text as typed), and their starting values.
// Kept out of the 'use client' form modules so the server pages can build initial values.
import type { RetentionTrigger } from "@/lib/validations/setup";

export interface CabinetTypeFormValues {
  name: string;
  description: string;
  keywords: string;
  retentionYears: string;
  retentionTrigger: RetentionTrigger;
  retentionSource: string;
}

export const EMPTY_TYPE: CabinetTypeFormValues = { name: "", description: "", keywords: "", retentionYears: "7", retentionTrigger: "after_filing", retentionSource: "" };

export interface ClientFormValues {
  name: string;
  aliases: string;
  emailDomains: string;
  taxIdLast4: string;
}

export const EMPTY_CLIENT: ClientFormValues = { name: "", aliases: "", emailDomains: "", taxIdLast4: "" };

export interface MatterFormValues {
  clientId: string;
  number: string;
  title: string;
  openedOn: string;
  status: "open" | "closed";
  closedOn: string;
  restricted: boolean;
  team: number[];
}

/** Today in UTC as YYYY-MM-DD: the default opened (and closed) date. */
export const todayUtc = () => new Date().toISOString().slice(0, 10);

export const emptyMatter = (): MatterFormValues => ({ clientId: "", number: "", title: "", openedOn: todayUtc(), status: "open", closedOn: "", restricted: false, team: [] });
