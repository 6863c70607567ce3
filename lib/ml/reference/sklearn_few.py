"""scikit-learn side of `npm run bench:few`: the two reference pipelines of
../shared/data/cuad-contracts/README.md on every k/draw of its splits.json, tested on `test`.
Body only: TfidfVectorizer(sublinear_tf=True, ngram_range=(1, 2), min_df=2); body + heading block:
the same stacked with TfidfVectorizer(sublinear_tf=True, ngram_range=(1, 2), min_df=1) on the first
300 characters; OneVsRestClassifier(LogisticRegression(C=10, solver="liblinear")).

usage: /usr/bin/python3 sklearn_few.py SPEC.json  (SPEC: {"contracts": path, "splits": path}) → JSON
"""
import json
import sys
import warnings

import numpy as np
import scipy.sparse as sp
from sklearn.feature_extraction.text import TfidfVectorizer
from sklearn.linear_model import LogisticRegression
from sklearn.metrics import f1_score
from sklearn.multiclass import OneVsRestClassifier

warnings.filterwarnings("ignore")


def run(docs, train, test, heading):
    y = np.array([docs[k]["label"] for k in train])
    yt = np.array([docs[k]["label"] for k in test])
    t = [docs[k]["text"] for k in train]
    e = [docs[k]["text"] for k in test]
    body = TfidfVectorizer(sublinear_tf=True, ngram_range=(1, 2), min_df=2)
    x, xe = body.fit_transform(t), None
    xe = body.transform(e)
    if heading:
        head = TfidfVectorizer(sublinear_tf=True, ngram_range=(1, 2), min_df=1)
        x = sp.hstack([x, head.fit_transform([s[:300] for s in t])]).tocsr()
        xe = sp.hstack([xe, head.transform([s[:300] for s in e])]).tocsr()
    clf = OneVsRestClassifier(LogisticRegression(C=10, solver="liblinear")).fit(x, y)
    scores = clf.decision_function(xe)
    order = np.argsort(-scores, axis=1)
    pred = clf.classes_[order[:, 0]]
    top3 = np.mean([yt[i] in clf.classes_[order[i, :3]] for i in range(len(yt))])
    return {"top1": float(np.mean(pred == yt)), "top3": float(top3), "macroF1": float(f1_score(yt, pred, average="macro"))}


def main():
    spec = json.load(open(sys.argv[1]))
    docs = {}
    for line in open(spec["contracts"]):
        if line.strip():
            d = json.loads(line)
            docs[d["pdf"]] = d
    splits = json.load(open(spec["splits"]))
    out = {}
    for name, train in splits["train"].items():
        out[name] = {"body": run(docs, train, splits["test"], False), "bodyHeading": run(docs, train, splits["test"], True)}
    print(json.dumps(out))


if __name__ == "__main__":
    main()
