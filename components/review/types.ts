// Shapes of the JSON the To review screen reads. Type-only imports from the Data Access Layer
// are erased at build time, so no server code reaches the browser.
import type { DocumentDetail } from "@/lib/data/documents";
import type { SuggestionDetail } from "@/lib/data/filing-record";
import type { QueueItem } from "@/lib/data/review";

export type { QueueItem };

export interface QueuePage {
  items: QueueItem[];
  total: number;
  page: number;
  pageSize: number;
}

/** What GET /api/documents/{id} answers (the screen reads only part of it). */
export interface DocumentView {
  document: DocumentDetail;
  suggestion: SuggestionDetail | null;
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
