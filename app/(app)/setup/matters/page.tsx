import type { Metadata } from "next";
import Form from "next/form";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { ClientForm } from "@/components/setup/client-form";
import { EMPTY_CLIENT, emptyMatter } from "@/components/setup/form-values";
import { ClientsTable } from "@/components/setup/clients-table";
import { INPUT } from "@/components/setup/field";
import { hrefWith, matchesQuery, pick, readParams, sortBy, type SearchParams } from "@/components/setup/list-query";
import { MatterForm, type Person } from "@/components/setup/matter-form";
import { MattersTable } from "@/components/setup/matters-table";
import { SetupHeader } from "@/components/setup/setup-header";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { listClients } from "@/lib/data/setup-clients";
import { listMatters, listTeamCandidates, type Matter } from "@/lib/data/setup-matters";

export const metadata: Metadata = { title: "Clients & matters · Setup" };

const PATH = "/setup/matters";
/** Setup lists every matter of the office on one page; an office of 2–50 people has hundreds, not millions. */
const ALL_MATTERS = 100_000;
const SORTS = ["number", "title", "client", "opened", "status"] as const;
const DONE: Record<string, string> = { "client-created": "added.", "client-saved": "saved.", "matter-created": "added.", "matter-saved": "saved." };

/** A team member who can no longer sign in still shows on their matter's form, so they can be taken off. */
function withFormerMembers(people: Person[], matter: Matter): Person[] {
  const former = matter.team.filter((m) => !people.some((p) => p.id === m.id)).map((m) => ({ ...m, role: "can no longer sign in" }));
  return [...people, ...former];
}

export default async function MattersPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const params = readParams(await searchParams);
  const [clients, { items: matters }, people] = await Promise.all([listClients(user), listMatters(user, { page: 1, pageSize: ALL_MATTERS }), listTeamCandidates()]);

  const status = pick(params.status, ["open", "closed", "all"] as const, "all");
  const restricted = pick(params.restricted, ["yes", "no", "any"] as const, "any");
  const sort = pick(params.sort, SORTS, "number");
  const dir = params.dir === "desc" ? "desc" : "asc";
  const shownMatters = matters.filter(
    (m) =>
      (status === "all" || m.status === status) &&
      (restricted === "any" || m.restricted === (restricted === "yes")) &&
      (!params.mclient || String(m.clientId) === params.mclient) &&
      matchesQuery(params.q, [m.number, m.title, m.clientName, ...m.team.map((p) => p.name)]),
  );
  const key = { number: (m: Matter) => m.number, title: (m: Matter) => m.title, client: (m: Matter) => m.clientName, opened: (m: Matter) => m.openedOn, status: (m: Matter) => m.status }[sort];
  const sortedMatters = sortBy(shownMatters, key, dir);

  const csort = pick(params.csort, ["name", "matters"] as const, "name");
  const cdir = params.cdir === "desc" ? "desc" : "asc";
  const shownClients = sortBy(
    clients.filter((c) => matchesQuery(params.cq, [c.name, ...c.aliases, ...c.emailDomains])),
    csort === "name" ? (c) => c.name : (c) => c.matterCount,
    cdir,
  );

  const editingClient = params.client === "new" ? "new" : clients.find((c) => String(c.id) === params.client);
  const editingMatter = params.matter === "new" ? "new" : matters.find((m) => String(m.id) === params.matter);
  const listParams = Object.fromEntries(Object.entries(params).filter(([k]) => !["client", "matter", "done", "name"].includes(k)));
  const done = params.done && DONE[params.done] ? `${params.name ?? "It"} ${DONE[params.done]}` : null;
  const hidden = (names: string[]) => names.filter((n) => params[n]).map((n) => <input key={n} type="hidden" name={n} value={params[n]} />);

  return (
    <section className="space-y-4">
      <SetupHeader title="Clients & matters" blurb="Clients with the names and addresses their papers use, and matters with their dates, status, restriction and team. Matter numbers are unique.">
        <span className="flex gap-2">
          <Link href={hrefWith(PATH, listParams, { client: "new" })} className="rounded border border-paper-edge bg-white/60 px-3 py-1.5 text-sm font-medium hover:bg-paper-deep" data-testid="add-client" scroll={false}>Add client</Link>
          <Link href={hrefWith(PATH, listParams, { matter: "new" })} className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark" data-testid="add-matter" scroll={false}>Add matter</Link>
        </span>
      </SetupHeader>
      {done && <Notice>{done}</Notice>}
      {(params.client && !editingClient) || (params.matter && !editingMatter) ? <Notice tone="warning">That client or matter was not found. Pick one from the lists.</Notice> : null}
      <div className="flex flex-col gap-4 xl:flex-row xl:items-start">
        <div className="min-w-0 flex-1 space-y-6">
          <div className="space-y-2">
            <h2 className="font-serif text-lg">Matters</h2>
            <Form action={PATH} className="flex flex-wrap items-end gap-3 text-xs text-ink-soft" aria-label="Filter matters">
              <label className="flex flex-col gap-0.5">
                Search
                <input name="q" defaultValue={params.q ?? ""} placeholder="number, title, client or person" className={`${INPUT} w-64`} />
              </label>
              <label className="flex flex-col gap-0.5">
                Status
                <select name="status" defaultValue={status} className={INPUT}>
                  <option value="all">Open and closed</option>
                  <option value="open">Open</option>
                  <option value="closed">Closed</option>
                </select>
              </label>
              <label className="flex flex-col gap-0.5">
                Restricted
                <select name="restricted" defaultValue={restricted} className={INPUT}>
                  <option value="any">Any</option>
                  <option value="yes">Restricted only</option>
                  <option value="no">Not restricted</option>
                </select>
              </label>
              <label className="flex flex-col gap-0.5">
                Client
                <select name="mclient" defaultValue={params.mclient ?? ""} className={INPUT}>
                  <option value="">Any client</option>
                  {clients.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
                </select>
              </label>
              {hidden(["sort", "dir", "cq", "csort", "cdir"])}
              <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark">Show</button>
              <Link href={PATH} className="py-1.5 text-sm text-verdigris hover:underline">Clear</Link>
            </Form>
            {sortedMatters.length ? (
              <MattersTable rows={sortedMatters} params={listParams} sort={sort} dir={dir} />
            ) : (
              <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft" data-testid="matters-empty">
                {matters.length === 0 ? "No matters yet. Add a client, then Add matter: its number, title, dates and who is on its team." : "No matter matches these filters. Clear them to see every matter."}
              </p>
            )}
          </div>
          <div className="space-y-2">
            <h2 className="font-serif text-lg">Clients</h2>
            <Form action={PATH} className="flex flex-wrap items-end gap-3 text-xs text-ink-soft" aria-label="Filter clients">
              <label className="flex flex-col gap-0.5">
                Search clients
                <input name="cq" defaultValue={params.cq ?? ""} placeholder="name, alias or domain" className={`${INPUT} w-64`} />
              </label>
              {hidden(["q", "status", "restricted", "mclient", "sort", "dir", "csort", "cdir"])}
              <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark">Show</button>
            </Form>
            {shownClients.length ? (
              <ClientsTable rows={shownClients} params={listParams} sort={csort} dir={cdir} />
            ) : (
              <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft">
                {clients.length === 0 ? "No clients yet. Add client: its name, the other names its papers use, its e-mail domains." : "No client matches this search."}
              </p>
            )}
          </div>
        </div>
        {(editingClient || editingMatter) && (
          <aside className="w-full shrink-0 rounded border border-paper-edge bg-white/70 p-4 xl:w-[26rem]" aria-label="Details">
            {editingClient ? (
              <ClientForm
                key={editingClient === "new" ? "new" : editingClient.id}
                id={editingClient === "new" ? undefined : editingClient.id}
                initial={editingClient === "new" ? EMPTY_CLIENT : { name: editingClient.name, aliases: editingClient.aliases.join(", "), emailDomains: editingClient.emailDomains.join(", "), taxIdLast4: editingClient.taxIdLast4 ?? "" }}
              />
            ) : editingMatter ? (
              <MatterForm
                key={editingMatter === "new" ? "new" : editingMatter.id}
                id={editingMatter === "new" ? undefined : editingMatter.id}
                clients={clients.map(({ id, name }) => ({ id, name }))}
                people={editingMatter === "new" ? people : withFormerMembers(people, editingMatter)}
                initial={
                  editingMatter === "new"
                    ? { ...emptyMatter(), clientId: params.mclient ?? "" }
                    : { clientId: String(editingMatter.clientId), number: editingMatter.number, title: editingMatter.title, openedOn: editingMatter.openedOn, status: editingMatter.status, closedOn: editingMatter.closedOn ?? "", restricted: editingMatter.restricted, team: editingMatter.team.map((p) => p.id) }
                }
              />
            ) : null}
          </aside>
        )}
      </div>
    </section>
  );
}
