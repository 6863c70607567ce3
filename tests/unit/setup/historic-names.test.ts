import { describe, expect, it } from "vitest";
import { nameAt, type NameHistory } from "@/lib/data/historic-names";

describe("the name an entity had at a moment", () => {
  // Renamed A → B at t=100, then B → C at t=200; current name C.
  const history: NameHistory = new Map([["cabinet_type:7", [{ at: 100, before: "A" }, { at: 200, before: "B" }]]]);
  it("is the name before the first rename after that moment, else the current one", () => {
    expect(nameAt(history, "cabinet_type", 7, new Date(50), "C")).toBe("A");
    expect(nameAt(history, "cabinet_type", 7, new Date(150), "C")).toBe("B");
    expect(nameAt(history, "cabinet_type", 7, new Date(250), "C")).toBe("C");
    expect(nameAt(history, "cabinet_type", 8, new Date(50), "D")).toBe("D");
    expect(nameAt(history, "matter", 7, new Date(50), "M-1")).toBe("M-1");
    expect(nameAt(history, "cabinet_type", null, new Date(50), null)).toBeNull();
  });
});
