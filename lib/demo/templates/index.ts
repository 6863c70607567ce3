// Every cabinet type's templates by type name; types the demo does not know get a generic memo.
import { COURT_ESTATE_TEMPLATES } from "./court-estate";
import { makeCoverLetter } from "./cover-letter";
import { makeGenericTemplate } from "./generic";
import { LEGAL_TEMPLATES } from "./legal";
import { MINUTES_LETTER_TEMPLATES } from "./minutes-letters";
import { MONEY_TEMPLATES } from "./money";
import type { Template } from "./parts";
import { TAX_PAYROLL_TEMPLATES } from "./tax-payroll";

export type { Template } from "./parts";

export const COVER_SHARE = 0.3;

export const TEMPLATES_BY_TYPE: Record<string, Template[]> = {
  ...MONEY_TEMPLATES,
  ...TAX_PAYROLL_TEMPLATES,
  ...LEGAL_TEMPLATES,
  ...COURT_ESTATE_TEMPLATES,
  ...MINUTES_LETTER_TEMPLATES,
};

/** The templates of a type; the demo types also get their covering letter, one pick in COVER_SHARE. */
export function findTemplates(type: { name: string; description?: string; keywords?: string[] }): Template[] {
  const own = TEMPLATES_BY_TYPE[type.name];
  if (own === undefined) return [makeGenericTemplate({ name: type.name, description: type.description ?? "", keywords: type.keywords ?? [] })];
  const cover = makeCoverLetter(type.name);
  // Repeating the cover letter sets its share without weights on every template.
  const copies = Math.max(1, Math.round((own.length * COVER_SHARE) / (1 - COVER_SHARE)));
  return [...own, ...Array.from({ length: copies }, () => cover)];
}
