"""Reference fit with scikit-learn for the tests and the benchmark of lib/ml.

Reads one JSON file written by lib/ml/reference/export.ts (a CSR matrix exported from our
vectoriser, integer labels, and the solver settings) and prints JSON: scikit-learn's version,
the one-vs-rest weights and intercepts, the fit time, and predictions on the test matrix.
Run with Debian's interpreter, /usr/bin/python3, which has python3-sklearn.
"""
import json
import sys
import time
import warnings

import numpy as np
import scipy.sparse as sp
import sklearn
from sklearn.exceptions import ConvergenceWarning
from sklearn.linear_model import LogisticRegression
from sklearn.multiclass import OneVsRestClassifier


def to_csr(m):
    return sp.csr_matrix(
        (np.array(m["data"], dtype=np.float64), np.array(m["indices"], dtype=np.int32), np.array(m["indptr"], dtype=np.int32)),
        shape=(m["rows"], m["cols"]),
    )


def main():
    spec = json.load(open(sys.argv[1]))
    x = to_csr(spec["train"])
    y = np.array(spec["labels"])
    clf = OneVsRestClassifier(
        LogisticRegression(
            C=spec["C"],
            solver=spec["solver"],
            tol=spec["tol"],
            max_iter=spec["maxIter"],
            class_weight="balanced" if spec.get("balanced") else None,
        ),
        n_jobs=spec.get("nJobs"),
    )
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", ConvergenceWarning)
        t0 = time.perf_counter()
        clf.fit(x, y)
        fit_seconds = time.perf_counter() - t0
    out = {"sklearn": sklearn.__version__, "fitSeconds": fit_seconds, "classes": clf.classes_.tolist()}
    if spec.get("returnWeights", True):
        out["weights"] = [e.coef_.ravel().tolist() for e in clf.estimators_]
        out["intercepts"] = [float(e.intercept_[0]) for e in clf.estimators_]
    if "test" in spec:
        xt = to_csr(spec["test"])
        t0 = time.perf_counter()
        out["predictions"] = clf.predict(xt).tolist()
        out["predictSeconds"] = time.perf_counter() - t0
    print(json.dumps(out))


if __name__ == "__main__":
    main()
