"""scikit-learn's classification_report and confusion_matrix for the metric tests of lib/ml.

Reads JSON {"labels": [...], "truth": [...], "predicted": [...]} from the file named on the
command line and prints {"sklearn", "report", "confusion"} as JSON. Run with /usr/bin/python3.
"""
import json
import sys

import sklearn
from sklearn.metrics import classification_report, confusion_matrix


def main():
    spec = json.load(open(sys.argv[1]))
    labels = spec["labels"]
    report = classification_report(spec["truth"], spec["predicted"], labels=labels, output_dict=True, zero_division=0)
    confusion = confusion_matrix(spec["truth"], spec["predicted"], labels=labels).tolist()
    print(json.dumps({"sklearn": sklearn.__version__, "report": report, "confusion": confusion}))


if __name__ == "__main__":
    main()
