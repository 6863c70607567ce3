// Invented names for the demo documents. None is meant to be a real person, firm, bank, court or
// agency; towns are made up too. E-mail domains end in .example (RFC 2606).
import { DEMO_OFFICE } from "@/db/demo/office";
import type { Random } from "./random";

export const GIVEN = ["Ana", "Bram", "Cosima", "Dario", "Elske", "Fenwick", "Greer", "Halvard", "Ines", "Joss", "Kestrel", "Liesel", "Mattias", "Noor", "Orla", "Piet", "Quilla", "Rosalind", "Saoirse", "Tobiah", "Ulla", "Vesna", "Wendell", "Ysolde"];
export const FAMILY = ["Abernathy", "Brightwater", "Calloway", "Dunmore", "Eskildsen", "Farrow", "Gilchrist", "Hollis", "Ivanova-Pratt", "Jessup", "Kettering", "Lowenthal", "Marchetti", "Nyberg", "Oyelaran", "Penhallow", "Quartermaine", "Rasmussen", "Sandoval-Reyes", "Thistlewood", "Umberfield", "Vantongeren", "Whitcombe", "Yarrowby"];
export const TOWNS = ["Westmere", "Fernhollow", "Easterby", "Callowmouth", "Brindle Cross", "Harrowgate Falls", "Lindenport", "Oakhythe"];
export const STREETS = ["Quay Road", "Tanner Lane", "Mill Race Street", "Bellfounder Way", "Orchard Row", "Cooper's Yard", "Saltmarsh Avenue", "Lantern Hill"];
export const VENDORS = ["Brightwater Flour Mills", "Kettle & Crane Supplies", "Northlight Office Goods", "Fernhollow Linen Service", "Penhallow Refrigeration", "Saltmarsh Courier Co.", "Tidewell Packaging", "Oakhythe Electrical"];
export const BANKS = ["Harbourline Savings Bank", "First Lindenport Trust Company", "Easterby Mutual Bank", "Cinderford Credit Union"];
export const CARDS = ["Meridian Business Card", "Harbourline Visa Business", "Corvid Corporate Card"];
export const AUTHORITIES = ["Department of Revenue of the State of Westmere", "Westmere Tax Commission", "Office of the Revenue Commissioner, Lindenport", "Federal Revenue Office, Easterby Service Center"];
export const COURTS = ["Superior Court of Westmere County", "District Court for the County of Lindenport", "Circuit Court of Easterby", "Probate Court of Fernhollow County"];
export const COUNTERPARTIES = ["Tidewell Holdings LLC", "Greystone Quay Properties", "Callowmouth Carriers Inc.", "Brindle Cross Estates", "Ashgrove Leasing Co.", "Northlight Equipment Rentals"];
export const OFFICE = { name: DEMO_OFFICE, domain: "alderquay.example", street: "9 Chandlery Walk", town: "Westmere" };

export function pickPerson(rng: Random): string {
  return `${rng.pick(GIVEN)} ${rng.pick(FAMILY)}`;
}

export function pickAddress(rng: Random): string[] {
  return [`${rng.int(2, 480)} ${rng.pick(STREETS)}`, `${rng.pick(TOWNS)}, WM ${rng.int(10000, 99999)}`];
}

/** "ana.calloway" from "Ana Calloway", for invented e-mail addresses. */
export function mailbox(person: string): string {
  return person.toLowerCase().replace(/[^a-z ]/g, "").trim().replace(/\s+/g, ".");
}
