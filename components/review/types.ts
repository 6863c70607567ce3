// Shapes of the JSON the To review screen reads. Type-only imports from the Data Access Layer
// are erased at build time, so no server code reaches the browser.
import type { QueueItem } from "@/lib/data/review";

export type { QueueItem };
export interface QueuePage {
  items: QueueItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface DocumentView {
  document: {
    id: number;
    name: string;
    status: string;
    reason: string | null;
    text: string | null;
    textTruncated: boolean;
    pageCount: number | null;
    ocrUsed: boolean;
    uploadedAt: string;
    uploadedBy: string;
    sensitive: { ssn: number; routing: number; card: number };
  };
  suggestion: null | {
    method: string;
    modelVersionId: number | null;
    noConfidentMatch: boolean;
    ranked: { cabinetTypeId: number; name: string; confidence: number; probability: number | null; source: string }[];
    why: { term: string; weight: number }[];
    matterCandidates: { matterId: number; number: string; title: string; score: number; reasons: string[] }[];
    matterId: number | null;
    matterAmbiguous: boolean;
  };
}

export interface Option {
  id: number;
  name: string;
}

export interface MatterOption {
  id: number;
  number: string;
  title: string;
  clientName: string;
}
