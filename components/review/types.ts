// Shapes of the JSON the To review screen reads. Type-only imports from the Data Access Layer
// are erased at build time, so no server code reaches the browser.
import type { DocumentDetail } from "@/lib/data/documents";
import type { SuggestionDetail } from "@/lib/data/filing-record";
import type { QueueItem, TypeCount } from "@/lib/data/review";

export type { QueueItem, TypeCount };

export interface QueuePage {
  items: QueueItem[];
  total: number;
  page: number;
  pageSize: number;
  /** Waiting per suggested cabinet type, under the same filters but the cabinet type's. */
  byType: TypeCount[];
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
