"use client";
import { useMemo, useState, forwardRef } from "react";
import { searchTypes } from "./type-search";
import type { Option } from "./types";

interface PickerProps {
  types: Option[];
  onPick: (id: number) => void;
  /** After Escape: focus goes back to the queue. */
  onDone?: () => void;
  /** The document's own ranking of the types (ids, most likely first): ties go to the likelier. */
  ranking?: number[];
  label?: string;
}

/**
 * A searchable list of every cabinet type (a combobox with a listbox): the list opens on focus,
 * letters narrow it (names starting with them first), ↓/↑ move, Enter chooses, Escape leaves
 * without choosing. Keys typed here never reach the queue's shortcuts.
 */
export const CabinetPicker = forwardRef<HTMLInputElement, PickerProps>(function CabinetPicker({ types, onPick, onDone, ranking, label = "Any cabinet type" }, ref) {
  const [query, setQuery] = useState("");
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const matches = useMemo(() => searchTypes(types, query, ranking), [types, query, ranking]);
  const pick = (id: number) => {
    setQuery("");
    setOpen(false);
    onPick(id);
  };
  return (
    <div className="relative">
      <label className="block text-xs text-ink-soft">
        {label} <kbd className="rounded border border-paper-edge px-1 font-mono">/</kbd>
        <input
          ref={ref}
          id="cabinet-picker"
          value={query}
          onFocus={() => {
            setOpen(true);
            setActive(0);
          }}
          onBlur={() => setOpen(false)}
          onChange={(e) => {
            setQuery(e.target.value);
            setActive(0);
            setOpen(true);
          }}
          onKeyDown={(e) => {
            e.stopPropagation();
            if (e.key === "ArrowDown") setActive((a) => Math.min(a + 1, matches.length - 1));
            else if (e.key === "ArrowUp") setActive((a) => Math.max(a - 1, 0));
            else if (e.key === "Enter" && open && matches[active]) pick(matches[active].id);
            else if (e.key === "Escape") {
              setQuery("");
              setOpen(false);
              onDone?.();
            } else return;
            e.preventDefault();
          }}
          placeholder="Type to search…"
          role="combobox"
          aria-expanded={open}
          aria-controls="cabinet-picker-list"
          aria-autocomplete="list"
          aria-activedescendant={open && matches[active] ? `cabinet-option-${matches[active].id}` : undefined}
          className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
          data-testid="cabinet-picker"
        />
      </label>
      <ul id="cabinet-picker-list" role="listbox" aria-label={label} className={`absolute z-20 mt-1 max-h-56 w-full overflow-auto rounded border border-paper-edge bg-white shadow ${open ? "" : "hidden"}`}>
        {open && matches.length === 0 && <li className="px-2 py-1 text-xs text-ink-soft">No cabinet type matches “{query}”.</li>}
        {open &&
          matches.map((t, i) => (
            <li
              key={t.id}
              id={`cabinet-option-${t.id}`}
              role="option"
              aria-selected={i === active}
              onMouseDown={(e) => {
                e.preventDefault();
                pick(t.id);
              }}
              className={`cursor-pointer px-2 py-1 text-sm ${i === active ? "bg-verdigris-light" : ""}`}
              data-testid="cabinet-option"
            >
              {t.name}
            </li>
          ))}
      </ul>
    </div>
  );
});
