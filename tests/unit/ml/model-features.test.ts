import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { crossValidate, predictDocument, trainModel } from "@/lib/ml";
import { buildPriorDocuments, priorsFromLabels, MODEL_TOKENIZE_OPTIONS } from "@/lib/ml/model-features";
import { fitVocabulary, headingColumns, transformTokens } from "@/lib/ml/tfidf";
import { headingText, tokenizeDocument } from "@/lib/ml/tokenize";
import type { LabelledDocument } from "@/lib/ml/types";
import { REPO_ROOT } from "./helpers";

describe("heading block", () => {
  it("takes head: terms from the document's start only, cut at a word", () => {
    const text = "TRUST DEED\n" + "filler ".repeat(60) + "invoice";
    expect(tokenizeDocument({ text: "TRUST DEED short" }, { ...MODEL_TOKENIZE_OPTIONS, headingChars: 40 }).some((t) => t.startsWith("head:"))).toBe(false);
    const heading = headingText({ text }, 40);
    expect(heading.length).toBeLessThanOrEqual(40);
    expect(heading.endsWith("fil")).toBe(false); // never half a word
    const tokens = tokenizeDocument({ text }, { ...MODEL_TOKENIZE_OPTIONS, headingChars: 40 });
    const head = tokens.filter((t) => t.startsWith("head:"));
    expect(head).toContain("head:trust");
    expect(head).toContain("head:trust deed");
    expect(head.some((t) => t.includes("invoic"))).toBe(false);
    expect(tokens).toContain("invoic"); // the body keeps the whole text (Porter stem)
  });

  it("prefers the reader's own heading when it has one", () => {
    const tokens = tokenizeDocument({ text: "page one of the lease", heading: "Deed of Trust" }, { ...MODEL_TOKENIZE_OPTIONS, headingChars: 300 });
    expect(tokens.filter((t) => t.startsWith("head:"))).toContain("head:deed");
    expect(tokens.filter((t) => t.startsWith("head:"))).not.toContain("head:leas");
  });

  it("scales the body block to norm 1 and the heading block to its weight", () => {
    const opts = { ...MODEL_TOKENIZE_OPTIONS, headingChars: 12 };
    const docs = [
      tokenizeDocument({ text: "Lease agreement for the shop, rent due monthly" }, opts),
      tokenizeDocument({ text: "Lease renewal notice, rent and deposit" }, opts),
    ];
    const vocab = fitVocabulary(docs, { minDf: 1, maxDf: 1, maxFeatures: 1000, headingWeight: 2.5 });
    const x = transformTokens(docs, vocab);
    const mask = headingColumns(vocab);
    for (let i = 0; i < x.rows; i++) {
      let body = 0;
      let head = 0;
      for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) {
        if (mask[x.indices[p]]) head += x.data[p] ** 2;
        else body += x.data[p] ** 2;
      }
      expect(Math.sqrt(body)).toBeCloseTo(1, 12);
      expect(Math.sqrt(head)).toBeCloseTo(2.5, 12);
    }
  });
});

describe("cabinet types as prior knowledge", () => {
  it("builds one pseudo-example per type with words: the name as heading, all words as body", () => {
    const docs = buildPriorDocuments([
      { label: "7", name: "Trust deeds", description: "Deeds creating a trust; names the trustee.", keywords: ["trustee", "settlor"] },
      { label: "8", name: "", description: "", keywords: [] },
    ]);
    expect(docs).toHaveLength(1);
    expect(docs[0].label).toBe("7");
    expect(docs[0].heading).toBe("Trust deeds trustee settlor");
    expect(docs[0].text).toContain("names the trustee");
    expect(docs[0].text).toContain("settlor");
  });

  // Synthetic office (made up for this test): 30 invoices that all look alike and 2 trust deeds.
  // A deed written for the type shares its description's words; with two examples only it is
  // still filed as a trust deed because the type's own words count as a weighted example.
  it("lets a type with 2 examples and a good description beat a type with 30", async () => {
    const invoices: LabelledDocument[] = Array.from({ length: 30 }, (_, i) => ({
      text: `Invoice ${1000 + i}\nAmount due for services rendered this month, payment within 30 days to the account of the firm. Reference ${i}.`,
      label: "invoice",
    }));
    const deeds: LabelledDocument[] = [
      { text: "Deed\nThis deed is made between the parties named below and is signed as a deed.", label: "trust" },
      { text: "Deed of gift\nThe parties sign this deed before a witness on the date below.", label: "trust" },
    ];
    const priors = [
      { label: "invoice", name: "Invoices", description: "Bills the firm sends or receives: amount due, payment terms.", keywords: ["invoice", "amount due"] },
      { label: "trust", name: "Trust deeds", description: "Deeds that create a trust: the settlor, the trustee, the beneficiaries and the trust fund.", keywords: ["trustee", "settlor", "beneficiary"] },
    ];
    const doc = { text: "Settlement\nThe settlor transfers the trust fund to the trustee to hold for the beneficiaries; payment of income due within 30 days to the account of each beneficiary." };
    const withPrior = await trainModel([...invoices, ...deeds], { threads: 1, tfidf: { minDf: 1 }, priors });
    const without = await trainModel([...invoices, ...deeds], { threads: 1, tfidf: { minDf: 1 }, priorWeight: 0 });
    expect(predictDocument(without, doc).label).toBe("invoice"); // without the prior the big type wins
    expect(predictDocument(withPrior, doc).label).toBe("trust");
  });
});

describe("command line and product", () => {
  it("evaluate on the command line gives the product's cross-validated figures", async () => {
    const file = path.join(REPO_ROOT, "tests/fixtures/ml/tiny.jsonl");
    const docs = fs.readFileSync(file, "utf8").split("\n").filter((l) => l.trim()).map((l) => JSON.parse(l) as LabelledDocument);
    // The product's training settings (lib/learning/retrain.ts): lib/ml's defaults, one thread,
    // the types' names as priors (on the command line the labels are the names).
    const product = await crossValidate(docs, 3, { threads: 1, tfidf: { minDf: 1 }, priors: priorsFromLabels(docs.map((d) => d.label)) });
    const cli = spawnSync(path.join(REPO_ROOT, "node_modules/.bin/tsx"), ["lib/ml/cli.ts", "evaluate", "--data", file, "--folds", "3", "--min-df", "1", "--threads", "1"], {
      cwd: REPO_ROOT,
      encoding: "utf8",
    });
    expect(cli.status).toBe(0);
    const report = JSON.parse(cli.stdout);
    expect(report.accuracy).toBe(product.accuracy);
    expect(report.macroF1).toBe(product.macroF1);
    expect(report.top3Accuracy).toBe(product.top3Accuracy);
    expect(report.vocabularySize).toBe(product.vocabularySize);
  });
});
