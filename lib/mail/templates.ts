// The text of every message Foldwright sends. Plain text: it reads the same in every mail program
// and a link is never hidden behind a button.
import type { OutgoingMail } from "@/lib/mail/transport";

const OFFICE_NOTE = "Foldwright files your office's documents. If you did not expect this message, you can ignore it.";

export function invitationMail(to: string, name: string, invitedBy: string, link: string, hours: number): OutgoingMail {
  return {
    to,
    subject: "You are invited to Foldwright",
    text: `Hello ${name},\n\n${invitedBy} invited you to Foldwright. Choose your password here:\n\n${link}\n\nThe link works once and expires in ${hours} hours. If it has expired, ask ${invitedBy} to send a new one.\n\n${OFFICE_NOTE}\n`,
  };
}

export function resetMail(to: string, name: string, link: string, minutes: number): OutgoingMail {
  return {
    to,
    subject: "Choose a new Foldwright password",
    text: `Hello ${name},\n\nSomeone (we hope you) asked to reset the password of this Foldwright account. Choose a new password here:\n\n${link}\n\nThe link works once and expires in ${minutes} minutes. Choosing a new password signs you out on every other device.\nIf you did not ask for this, ignore this message: your password stays as it is.\n`,
  };
}

export interface DigestFigures {
  waiting: number;
  oldestSince: Date;
  lowestConfidence: number | null;
}

export function digestMail(to: string, name: string, f: DigestFigures, link: string): OutgoingMail {
  const days = Math.floor((Date.now() - f.oldestSince.getTime()) / 86_400_000);
  const oldest = days < 1 ? "since today" : `for ${days} day${days === 1 ? "" : "s"}`;
  const lowest = f.lowestConfidence === null ? "" : `\nLowest confidence: ${Math.round(f.lowestConfidence * 100)}%`;
  return {
    to,
    subject: `${f.waiting} document${f.waiting === 1 ? " waits" : "s wait"} in To review`,
    text: `Hello ${name},\n\n${f.waiting} document${f.waiting === 1 ? " waits" : "s wait"} in To review for you.\nOldest: waiting ${oldest} (since ${f.oldestSince.toISOString().slice(0, 16).replace("T", " ")} UTC)${lowest}\n\nOpen To review: ${link}\n\nYou get this digest on days when something waits. Switch it off on your profile page.\n`,
  };
}

export function retrainAlertMail(to: string, versionId: number, status: string, reason: string, link: string): OutgoingMail {
  return {
    to,
    subject: `Retraining ${status === "failed" ? "failed" : "was not promoted"}: model version #${versionId}`,
    text: `Model version #${versionId} was ${status === "failed" ? "not trained to the end" : "trained but not promoted"}.\n\nReason: ${reason}\n\nThe current model keeps serving. See the versions and their metrics: ${link}\n\nYou get these alerts as an admin. Switch them off on your profile page.\n`,
  };
}

export interface ReceiptLine {
  name: string;
  fate: "reading" | "duplicate" | "rejected";
  sentence: string;
}

export function scanReceiptMail(to: string, subject: string | null, lines: ReceiptLine[]): OutgoingMail {
  const filed = lines.filter((l) => l.fate === "reading").length;
  const list = lines.map((l, i) => `${i + 1}. ${l.name}: ${l.sentence}`).join("\n");
  return {
    to,
    subject: `Received: ${filed} of ${lines.length} attachment${lines.length === 1 ? "" : "s"} taken in${subject ? ` (${subject.slice(0, 120)})` : ""}`,
    text: `Foldwright received your message${subject ? ` "${subject}"` : ""}. What became of each attachment:\n\n${list}\n\nDocuments taken in are read and then wait in To review for a person to file them. Suggestions are machine output: a person remains responsible for filing privileged or sensitive documents.\n`,
  };
}
