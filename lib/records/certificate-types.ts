// The shape of a certificate of disposal, shared by the data layer and the PDF and CSV writers.
export interface CertificateItem {
  documentId: number;
  name: string;
  sha256: string;
  matter: string | null;
  cabinetType: string | null;
  uploadedAt: string;
  filedAt: string | null;
  dueOn: string;
  rule: string;
  ruleSource: string;
  outcome: string;
  disposedAt: string | null;
  objectDeletedAt: string | null;
}

export interface Certificate {
  batchId: number;
  note: string;
  proposedBy: string;
  proposedAt: string;
  approvedBy: string;
  approvedAt: string;
  destroyed: CertificateItem[];
  kept: CertificateItem[];
  caution: string;
}
