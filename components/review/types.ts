// Shapes of the JSON the To review screen reads (see lib/data/review.ts and filing-record.ts).
export interface QueueItem {
  id: number;
  name: string;
  status: "ready" | "unreadable";
  reason: string | null;
  uploadedAt: string;
  pageCount: number | null;
  ocrUsed: boolean;
  filedHow: string | null;
  suggestion: null | {
    method: "model" | "cold_start" | "blended";
    modelVersionId: number | null;
    cabinetTypeId: number | null;
    cabinetType: string | null;
    confidence: number | null;
    noConfidentMatch: boolean;
    matterId: number | null;
    matter: string | null;
    matterAmbiguous: boolean;
  };
  filedIn: null | { cabinetTypeId: number; cabinetType: string; matterId: number; matter: string };
}

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
