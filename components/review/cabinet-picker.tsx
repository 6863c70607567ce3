"use client";
import { useMemo, useState, forwardRef } from "react";
import type { Option } from "./types";

interface PickerProps {
  types: Option[];
  onPick: (id: number) => void;
  label?: string;
}

/** A searchable list of every cabinet type: type to filter, ↓/↑ to move, Enter to choose. */
export const CabinetPicker = forwardRef<HTMLInputElement, PickerProps>(function CabinetPicker({ types, onPick, label = "Any cabinet type" }, ref) {
  const [query, setQuery] = useState("");
  const [active, setActive] = useState(0);
  const matches = useMemo(() => types.filter((t) => t.name.toLowerCase().includes(query.trim().toLowerCase())), [types, query]);
  return (
    <div className="relative">
      <label className="block text-xs text-ink-soft">
        {label} <kbd className="rounded border border-paper-edge px-1 font-mono">/</kbd>
        <input
          ref={ref}
          value={query}
          onChange={(e) => {
            setQuery(e.target.value);
            setActive(0);
          }}
          onKeyDown={(e) => {
            if (e.key === "ArrowDown") setActive((a) => Math.min(a + 1, matches.length - 1));
            else if (e.key === "ArrowUp") setActive((a) => Math.max(a - 1, 0));
            else if (e.key === "Enter" && matches[active]) {
              e.preventDefault();
              onPick(matches[active].id);
              setQuery("");
            } else if (e.key === "Escape") (e.target as HTMLInputElement).blur();
            else return;
            e.stopPropagation();
          }}
          placeholder="Type to search…"
          role="combobox"
          aria-expanded={query.length > 0}
          aria-controls="cabinet-picker-list"
          className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
        />
      </label>
      {query.length > 0 && (
        <ul id="cabinet-picker-list" role="listbox" className="absolute z-10 mt-1 max-h-56 w-full overflow-auto rounded border border-paper-edge bg-white shadow">
          {matches.length === 0 && <li className="px-2 py-1 text-xs text-ink-soft">No cabinet type matches “{query}”.</li>}
          {matches.map((t, i) => (
            <li
              key={t.id}
              role="option"
              aria-selected={i === active}
              onMouseDown={(e) => {
                e.preventDefault();
                onPick(t.id);
                setQuery("");
              }}
              className={`cursor-pointer px-2 py-1 text-sm ${i === active ? "bg-verdigris-light" : ""}`}
            >
              {t.name}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
});
