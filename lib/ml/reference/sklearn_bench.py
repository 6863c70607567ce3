"""scikit-learn side of `npm run bench:classifier`: the README's reference pipeline on the raw
CUAD clause files, timed the same way as ours (vectorise, fit, predict), for liblinear and lbfgs.

usage: /usr/bin/python3 sklearn_bench.py SPEC.json  (SPEC: {"train": path, "test": path}) → JSON on stdout
"""
import json
import sys
import time
import warnings

import numpy as np
import sklearn
from sklearn.exceptions import ConvergenceWarning
from sklearn.feature_extraction.text import TfidfVectorizer
from sklearn.linear_model import LogisticRegression
from sklearn.metrics import accuracy_score, f1_score
from sklearn.multiclass import OneVsRestClassifier


def load(path):
    rows = [json.loads(line) for line in open(path) if line.strip()]
    return [r["text"] for r in rows], np.array([r["label"] for r in rows])


def main():
    spec = json.load(open(sys.argv[1]))
    train_text, train_y = load(spec["train"])
    test_text, test_y = load(spec["test"])
    t0 = time.perf_counter()
    vec = TfidfVectorizer(sublinear_tf=True, ngram_range=(1, 2), min_df=2)
    x = vec.fit_transform(train_text)
    xt = vec.transform(test_text)
    vectorise = time.perf_counter() - t0
    runs = []
    for solver in ["liblinear", "lbfgs"]:
        for n_jobs in [None, 2]:
            clf = OneVsRestClassifier(LogisticRegression(C=10, solver=solver, max_iter=1000), n_jobs=n_jobs)
            with warnings.catch_warnings():
                warnings.simplefilter("ignore", ConvergenceWarning)
                t0 = time.perf_counter()
                clf.fit(x, train_y)
                fit = time.perf_counter() - t0
            t0 = time.perf_counter()
            scores = clf.decision_function(xt)
            pred = clf.classes_[scores.argmax(axis=1)]
            predict = time.perf_counter() - t0
            top3 = np.argsort(-scores, axis=1)[:, :3]
            top3_acc = float(np.mean([test_y[i] in clf.classes_[top3[i]] for i in range(len(test_y))]))
            runs.append({
                "solver": solver,
                "nJobs": n_jobs or 1,
                "fitSeconds": fit,
                "predictSeconds": predict,
                "accuracy": accuracy_score(test_y, pred),
                "macroF1": f1_score(test_y, pred, average="macro"),
                "top3Accuracy": top3_acc,
            })
    print(json.dumps({"sklearn": sklearn.__version__, "vectoriseSeconds": vectorise, "terms": x.shape[1], "nonZeros": int(x.nnz), "runs": runs}))


if __name__ == "__main__":
    main()
