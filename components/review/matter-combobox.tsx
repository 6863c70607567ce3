"use client";
// The matter step: a type-to-search combobox (WAI-ARIA 1.2 combobox with a listbox, from
// downshift's useCombobox) over the matter number, the client and the title. The matters found
// in the document come first, then the ones this browser filed into last, then the rest.
// Escape closes it and hands focus back (never changing the value); leaving it never picks
// anything; every key typed in it stays in it, so no letter reaches the queue's shortcuts.
import { Fragment, useMemo, useState } from "react";
import { useCombobox } from "downshift";
import type { MatterOption } from "./types";

export interface MatterCandidateOption {
  matterId: number;
  reasons: string[];
}

interface Props {
  id: string;
  label: string;
  matters: MatterOption[];
  candidates?: MatterCandidateOption[];
  /** Matter ids this person filed into last, most recent first. */
  recent?: number[];
  value: number | null;
  onChange: (matterId: number) => void;
  /** Called after Escape and after a choice: focus goes back to the queue. */
  onDone: () => void;
  hint?: React.ReactNode;
}

type Group = "found" | "recent" | "all";
interface Entry {
  matter: MatterOption;
  group: Group;
  reasons: string[];
}

const GROUP_WORDS: Record<Group, string> = { found: "Found in the document", recent: "Filed into last", all: "All matters" };

export const matterLabel = (m: MatterOption) => `${m.number} — ${m.clientName}: ${m.title}`;

/** The options in order: found, recent, all; each kept once, under its first group. */
export function orderMatters(matters: MatterOption[], candidates: MatterCandidateOption[], recent: number[]): Entry[] {
  const byId = new Map(matters.map((m) => [m.id, m]));
  const seen = new Set<number>();
  const out: Entry[] = [];
  const add = (id: number, group: Group, reasons: string[] = []) => {
    const m = byId.get(id);
    if (!m || seen.has(id)) return;
    seen.add(id);
    out.push({ matter: m, group, reasons });
  };
  for (const c of candidates) add(c.matterId, "found", c.reasons);
  for (const id of recent) add(id, "recent");
  for (const m of matters) add(m.id, "all");
  return out;
}

/** Every word typed must appear in the number, the client or the title (any case). */
export function matchesQuery(m: MatterOption, query: string): boolean {
  const hay = `${m.number} ${m.clientName} ${m.title}`.toLowerCase();
  return query.toLowerCase().split(/\s+/).filter(Boolean).every((w) => hay.includes(w));
}

export function MatterCombobox({ id, label, matters, candidates = [], recent = [], value, onChange, onDone, hint }: Props) {
  const ordered = useMemo(() => orderMatters(matters, candidates, recent), [matters, candidates, recent]);
  const selected = ordered.find((e) => e.matter.id === value) ?? null;
  const itemToString = (e: Entry | null) => (e ? matterLabel(e.matter) : "");
  const [inputValue, setInputValue] = useState(itemToString(selected));
  // The chosen matter's own words show the whole list; anything else typed filters it.
  const typed = selected && inputValue === itemToString(selected) ? "" : inputValue;
  const items = useMemo(() => ordered.filter((e) => matchesQuery(e.matter, typed)), [ordered, typed]);
  const { isOpen, highlightedIndex, getLabelProps, getInputProps, getMenuProps, getItemProps, openMenu, closeMenu } = useCombobox<Entry>({
    id,
    inputId: id,
    items,
    itemToString,
    itemToKey: (e) => e?.matter.id,
    selectedItem: selected,
    inputValue,
    onInputValueChange: ({ inputValue: v }) => setInputValue(v ?? ""),
    defaultHighlightedIndex: 0,
    onSelectedItemChange: ({ selectedItem }) => {
      if (!selectedItem) return;
      onChange(selectedItem.matter.id);
      onDone();
    },
    stateReducer: (state, { type, changes }) => {
      // Leaving the field never picks the highlighted matter, and shows the chosen one again.
      if (type === useCombobox.stateChangeTypes.InputBlur) return { ...changes, selectedItem: state.selectedItem, inputValue: itemToString(state.selectedItem) };
      return changes;
    },
  });

  const onKeyDown = (e: React.KeyboardEvent<HTMLInputElement>) => {
    // Keys typed here are the combobox's own: none reaches the queue's shortcuts.
    e.stopPropagation();
    if (e.key === "Enter" && (!isOpen || highlightedIndex < 0) && items.length > 0) {
      // Enter before the list has opened (a fast typist) takes the first matter shown, as it would.
      (e.nativeEvent as KeyboardEvent & { preventDownshiftDefault?: boolean }).preventDownshiftDefault = true;
      e.preventDefault();
      const first = items[0];
      closeMenu();
      setInputValue(itemToString(first));
      onChange(first.matter.id);
      onDone();
      return;
    }
    if (e.key === "Escape") {
      // Our Escape, not downshift's (which clears the choice when the list is closed).
      (e.nativeEvent as KeyboardEvent & { preventDownshiftDefault?: boolean }).preventDownshiftDefault = true;
      e.preventDefault();
      closeMenu();
      setInputValue(itemToString(selected));
      onDone();
    }
  };

  let lastGroup: Group | null = null;
  return (
    <div className="relative">
      <label {...getLabelProps()} className="block text-xs text-ink-soft">
        {label}
      </label>
      {hint}
      <input
        {...getInputProps({
          onKeyDown,
          // The typed value is kept at once (not after downshift's own state change), so no fast key is lost.
          onChange: (e) => setInputValue(e.currentTarget.value),
          onFocus: (e) => {
            e.currentTarget.select();
            if (!isOpen) openMenu();
          },
        })}
        placeholder="Type a matter number, client or title…"
        className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink"
        data-testid={`${id}-input`}
      />
      <ul
        {...getMenuProps()}
        className={`absolute z-20 mt-1 max-h-64 w-full overflow-auto rounded border border-paper-edge bg-white shadow ${isOpen ? "" : "hidden"}`}
        data-testid={`${id}-list`}
      >
        {isOpen && items.length === 0 && <li className="px-2 py-1 text-xs text-ink-soft">No open matter matches “{inputValue}”.</li>}
        {isOpen &&
          items.map((entry, index) => {
            const header = entry.group !== lastGroup ? GROUP_WORDS[entry.group] : null;
            lastGroup = entry.group;
            return (
              <Fragment key={entry.matter.id}>
                {header && (
                  <li role="presentation" className="border-t border-paper-edge bg-paper px-2 py-0.5 text-[11px] font-semibold uppercase tracking-wide text-ink-soft first:border-t-0">
                    {header}
                  </li>
                )}
                <li
                  {...getItemProps({ item: entry, index })}
                  className={`cursor-pointer px-2 py-1 text-sm ${highlightedIndex === index ? "bg-verdigris-light" : ""} ${selected?.matter.id === entry.matter.id ? "font-semibold" : ""}`}
                  data-testid="matter-option"
                  data-matter-id={entry.matter.id}
                >
                  <span className="font-mono text-xs">{entry.matter.number}</span> — {entry.matter.clientName}: {entry.matter.title}
                  {entry.reasons.length > 0 && <span className="block text-xs text-ink-soft">{entry.reasons.join(", ")}</span>}
                </li>
              </Fragment>
            );
          })}
      </ul>
    </div>
  );
}
