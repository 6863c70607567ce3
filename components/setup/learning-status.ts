// What the screen says about how the model knows a cabinet type (DESIGN §5, cold start).
export interface LearningInput {
  active: boolean;
  humanFiledCount: number;
  /** The current model was trained on this type. */
  learned: boolean;
  minExamples: number;
}

export interface LearningStatus {
  tone: "ok" | "cold" | "retired";
  text: string;
  /** For sorting: retired last, then the types furthest from being learned. */
  needed: number;
}

export function learningStatus({ active, humanFiledCount, learned, minExamples }: LearningInput): LearningStatus {
  if (!active) return { tone: "retired", text: "Retired: never suggested", needed: Number.MAX_SAFE_INTEGER };
  const needed = Math.max(0, minExamples - humanFiledCount);
  if (needed > 0) {
    return { tone: "cold", text: `Needs ${needed} more filed example${needed === 1 ? "" : "s"}; ranks by its description until then`, needed };
  }
  if (!learned) return { tone: "cold", text: "Enough examples: learned at the next retrain", needed: 0 };
  return { tone: "ok", text: `Learned by the model (${humanFiledCount} filed example${humanFiledCount === 1 ? "" : "s"})`, needed: 0 };
}

const TRIGGER_WORDS = { after_filing: "after filing", after_matter_close: "after the matter closes", permanent: "permanent" } as const;

export function retentionWords(years: number | null, trigger: keyof typeof TRIGGER_WORDS): string {
  if (trigger === "permanent") return "Permanent";
  return `${years} year${years === 1 ? "" : "s"} ${TRIGGER_WORDS[trigger]}`;
}
