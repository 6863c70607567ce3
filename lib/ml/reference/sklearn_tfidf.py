"""scikit-learn's TfidfVectorizer on token lists made by lib/ml, for the vectoriser test.

Reads JSON {"docs": [[token, …], …], "minDf", "maxDf"} and prints {"sklearn", "terms",
"indptr", "indices", "data"} with the same definitions we claim: sublinear tf, smooth idf, L2.
Run with /usr/bin/python3.
"""
import json
import sys

import sklearn
from sklearn.feature_extraction.text import TfidfVectorizer


def main():
    spec = json.load(open(sys.argv[1]))
    vec = TfidfVectorizer(analyzer=lambda tokens: tokens, sublinear_tf=True, smooth_idf=True, norm="l2", min_df=spec["minDf"], max_df=spec["maxDf"])
    x = vec.fit_transform(spec["docs"]).tocsr()
    x.sort_indices()
    terms = vec.get_feature_names_out().tolist()
    print(json.dumps({"sklearn": sklearn.__version__, "terms": terms, "indptr": x.indptr.tolist(), "indices": x.indices.tolist(), "data": x.data.tolist()}))


if __name__ == "__main__":
    main()
