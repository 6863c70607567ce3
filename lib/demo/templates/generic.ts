// A plain template for a cabinet type the demo has no templates for (an admin's own type):
// a memo built from the type's description and keywords, so it is still learnable.
import type { Template } from "./parts";
import { addressee, identifiers, pickSome, signOff } from "./parts";

export function makeGenericTemplate(type: { name: string; description: string; keywords: string[] }): Template {
  return (ctx) => ({
    fileStem: type.name.toLowerCase(),
    blocks: [
      { kind: "heading", text: type.name },
      addressee(ctx),
      ...identifiers(ctx),
      { kind: "paragraph", text: `${type.description} Concerning ${ctx.client}.` },
      { kind: "paragraph", text: `Key points: ${pickSome(ctx, type.keywords, Math.min(3, type.keywords.length)).join("; ")}.` },
      signOff(ctx, "Office"),
    ],
  });
}
