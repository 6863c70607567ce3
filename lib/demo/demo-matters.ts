// The demo office's matters joined with their clients, in the shape the generators take.
import { DEMO_CLIENTS, DEMO_MATTERS } from "@/db/demo/office";
import type { DemoMatterInput } from "./context";

export function listDemoMatters(): DemoMatterInput[] {
  return DEMO_MATTERS.map((m) => {
    const client = DEMO_CLIENTS.find((c) => c.name === m.client);
    if (!client) throw new Error(`Demo matter ${m.number} names client "${m.client}", which is not in DEMO_CLIENTS; add the client or fix the name.`);
    return { number: m.number, title: m.title, clientName: client.name, aliases: client.aliases, emailDomains: client.emailDomains, taxIdLast4: client.taxIdLast4 };
  });
}
