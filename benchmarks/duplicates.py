"""Near-duplicate accuracy against brute-force exact Jaccard, and index cost at scale.

    .venv/bin/python benchmarks/duplicates.py [--docs 2400] [--index 10000 100000]
                                              [--sketches]

Part 1 generates an invented corpus of near-duplicate families (a base text and variants
with a chosen share of words edited, so true Jaccard similarities spread from about 0.3 to
1.0) plus decoys that share a long boilerplate block but not their body text. It runs the
duplicate check exactly as the pipeline does (measure, then evaluate with the policy's
threshold 0.80) and compares every decision with exact Jaccard on the shingle sets,
computed by brute force over all pairs: recall for documents whose true similarity to a
kept document is >= 0.85, the false-duplicate rate below 0.5, and precision.

Part 3 (``--sketches``) compares sketches of the same shingle hashes on every pair of a
family and every decoy pair, against their exact Jaccard: gate's (256 permutations,
datasketch's affine32 values computed in numpy blocks), datasketch's own per-item
``update_batch`` (the same values), the first 128 of those permutations, and one-permutation
hashing with optimal densification (Shrivastava 2017; 256 bins): time per document, mean
absolute error, the share of pairs at true J >= 0.85 estimated at >= 0.80 and of pairs
below 0.5 estimated at >= 0.80.

Part 2 fills MinHashLSH with the gate's parameters (256 permutations, bands for 0.80) and
measures insert and query time and Python heap per indexed document at 10k and 100k.
"""

from __future__ import annotations

import argparse
import random
import sys
import time
import tracemalloc
from pathlib import Path

import numpy as np

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from datasketch import MinHashLSH  # noqa: E402

from gate.checks import duplicate as dup  # noqa: E402


def shingles(tokens: list[str], w: int = 5) -> set[str]:
    """Broder's w-shingling as plain strings: the brute-force reference."""
    if len(tokens) < w:
        return {" ".join(tokens)} if tokens else set()
    return {" ".join(tokens[i:i + w]) for i in range(len(tokens) - w + 1)}
from gate.policy import parse_policy  # noqa: E402

SETTINGS = parse_policy("version: 1\nname: b\nduplicates:\n  threshold: 0.80\n", "b").duplicates


def vocabulary(rng: random.Random, size: int = 6000) -> list[str]:
    letters = "abcdefghijklmnopqrstuvwxyz"
    return ["".join(rng.choice(letters) for _ in range(rng.randint(3, 9))) for _ in range(size)]


def zipf_text(rng: random.Random, vocab: list[str], words: int) -> list[str]:
    weights = [1 / (i + 1) for i in range(len(vocab))]
    return rng.choices(vocab, weights=weights, k=words)


def edit(rng: random.Random, words: list[str], vocab: list[str], share: float) -> list[str]:
    out = list(words)
    for _ in range(int(len(out) * share)):
        i = rng.randrange(len(out))
        action = rng.random()
        if action < 0.5:
            out[i] = rng.choice(vocab)
        elif action < 0.75:
            out.insert(i, rng.choice(vocab))
        elif len(out) > 10:
            del out[i]
    return out


def corpus(n: int, seed: int = 3) -> list[tuple[str, str, str]]:
    """(key, family, text): families of variants, singletons, and boilerplate decoys."""
    rng = random.Random(seed)
    vocab = vocabulary(rng)
    boiler = zipf_text(rng, vocab, 250)
    docs: list[tuple[str, str, str]] = []
    family = 0
    while len(docs) < n:
        kind = rng.random()
        base = zipf_text(rng, vocab, rng.randint(300, 700))
        if kind < 0.55:  # a family: base plus variants with 0.5% .. 20% of words edited
            docs.append((f"d{len(docs):05d}", f"f{family}", " ".join(base)))
            for _ in range(rng.randint(1, 4)):
                share = rng.choice([0.005, 0.01, 0.02, 0.03, 0.05, 0.08, 0.12, 0.2])
                docs.append((f"d{len(docs):05d}", f"f{family}",
                             " ".join(edit(rng, base, vocab, share))))
            family += 1
        elif kind < 0.8:  # a decoy: shared boilerplate, own body
            docs.append((f"d{len(docs):05d}", "decoy", " ".join(boiler + base[:300])))
        else:
            docs.append((f"d{len(docs):05d}", "single", " ".join(base)))
    return docs[:n]


def part1(n: int) -> None:
    docs = corpus(n)
    items, shingle_sets = [], {}
    started = time.perf_counter()
    for index, (key, _family, text) in enumerate(docs):
        measured = dup.measure(type("E", (), {"text": text})())
        shingle_sets[key] = shingles(dup.words(text))
        items.append(dup.Item(key=key, path=key, sha256=key, text_sha256=measured["text_sha256"],
                              minhash=measured["minhash"], trust=1, date=None,
                              seen=(1, index)))
    measured_s = time.perf_counter() - started
    started = time.perf_counter()
    outcome = dup.evaluate(items, SETTINGS)
    evaluate_s = time.perf_counter() - started
    flagged = {key: findings[0].details["keeper_id"] for key, findings in outcome.findings.items()}
    keepers = sorted(outcome.keepers)
    started = time.perf_counter()
    # brute force: each document's best exact Jaccard against the keepers (a kept document
    # is compared only with keepers before it, which it should not resemble)
    order = {key: i for i, (key, _f, _t) in enumerate(docs)}
    best: dict[str, float] = {}
    for key, _family, _text in docs:
        mine = shingle_sets[key]
        top = 0.0
        for other in keepers:
            if other == key or order[other] > order[key] and key in outcome.keepers:
                continue
            theirs = shingle_sets[other]
            inter = len(mine & theirs)
            if inter:
                top = max(top, inter / (len(mine) + len(theirs) - inter))
        best[key] = top
    brute_s = time.perf_counter() - started
    high = [k for k, j in best.items() if j >= 0.85]
    low = [k for k, j in best.items() if j < 0.5]
    at_threshold = [k for k, j in best.items() if j >= 0.8]
    recall = sum(k in flagged for k in high) / len(high) if high else float("nan")
    recall80 = sum(k in flagged for k in at_threshold) / len(at_threshold)
    false_low = sum(k in flagged for k in low) / len(low) if low else 0.0
    precision_pairs = [
        len(shingle_sets[k] & shingle_sets[v]) / len(shingle_sets[k] | shingle_sets[v])
        for k, v in flagged.items()]
    precision = sum(j >= 0.8 for j in precision_pairs) / len(precision_pairs)
    near_miss = sum(j >= 0.75 for j in precision_pairs) / len(precision_pairs)
    decoys = [k for k, f, _ in docs if f == "decoy"]
    print(f"corpus: {len(docs)} documents, {len(set(f for _, f, _ in docs)) - 2} families, "
          f"{len(decoys)} boilerplate decoys")
    print(f"timing: measure {measured_s / len(docs) * 1000:.2f} ms/doc, evaluate "
          f"{evaluate_s:.2f} s total, brute force {brute_s:.1f} s")
    print(f"flagged as duplicates: {len(flagged)}; true J>=0.85 to a keeper: {len(high)}; "
          f"J>=0.80: {len(at_threshold)}; J<0.5: {len(low)}")
    print(f"recall at true J >= 0.85: {recall:.4f} (goal >= 0.97); at J >= 0.80: "
          f"{recall80:.4f}")
    print(f"false duplicates below J 0.5: {false_low:.4%} (goal <= 1%); decoys flagged: "
          f"{sum(k in flagged for k in decoys)}/{len(decoys)}")
    print(f"precision (flagged pair's true J >= 0.80): {precision:.4f}; with true J >= 0.75: "
          f"{near_miss:.4f}")


def part2(sizes: list[int]) -> None:
    bands, rows = dup.band_params(SETTINGS.threshold)
    print(f"LSH: {dup.NUM_PERM} permutations, {bands} bands x {rows} rows")
    rng = np.random.default_rng(1)
    for n in sizes:
        values = rng.integers(0, 2**32, size=(n, dup.NUM_PERM), dtype=np.uint64)
        sketches = [dup.lean(v.astype("<u4").tobytes()) for v in values]
        tracemalloc.start()  # memory in one build, time in another (tracing slows it)
        before = tracemalloc.get_traced_memory()[0]
        lsh = MinHashLSH(num_perm=dup.NUM_PERM, params=(bands, rows))
        with lsh.insertion_session() as session:
            for i, sketch in enumerate(sketches):
                session.insert(f"k{i}", sketch, check_duplication=False)
        heap = tracemalloc.get_traced_memory()[0] - before
        tracemalloc.stop()
        del lsh
        lsh = MinHashLSH(num_perm=dup.NUM_PERM, params=(bands, rows))
        started = time.perf_counter()
        with lsh.insertion_session() as session:
            for i, sketch in enumerate(sketches):
                session.insert(f"k{i}", sketch, check_duplication=False)
        insert_s = time.perf_counter() - started
        queries = [dup.lean(v.astype("<u4").tobytes())
                   for v in rng.integers(0, 2**32, size=(2000, dup.NUM_PERM), dtype=np.uint64)]
        near = []
        for v in values[:2000]:
            w = v.copy()
            w[: dup.NUM_PERM // 12] = rng.integers(0, 2**32, size=dup.NUM_PERM // 12)
            near.append(dup.lean(w.astype("<u4").tobytes()))
        started = time.perf_counter()
        hits = sum(bool(lsh.query(q)) for q in near)
        for q in queries:
            lsh.query(q)
        query_s = (time.perf_counter() - started) / 4000
        sketch_bytes = dup.NUM_PERM * 4
        print(f"indexed {n:>7}: insert {insert_s / n * 1e6:6.1f} us/doc, query "
              f"{query_s * 1e6:6.1f} us, LSH heap {heap / n / 1024:5.2f} KB/doc (+ "
              f"{sketch_bytes} B packed sketch), near-duplicate queries found "
              f"{hits}/2000")


_GOLDEN = np.uint64(0x9E3779B97F4A7C15)


def _mix64(x: np.ndarray) -> np.ndarray:
    """splitmix64's finalizer (a bijection on 64 bits), element-wise."""
    with np.errstate(over="ignore"):
        x = x.astype(np.uint64) + _GOLDEN
        x = (x ^ (x >> np.uint64(30))) * np.uint64(0xBF58476D1CE4E5B9)
        x = (x ^ (x >> np.uint64(27))) * np.uint64(0x94D049BB133111EB)
        return x ^ (x >> np.uint64(31))


def oph_densified(hashes: np.ndarray, k: int = 256) -> np.ndarray:
    """One-permutation hashing into k bins, empty bins filled by optimal densification
    (Shrivastava 2017: an empty bin borrows from the first non-empty bin a per-bin hash
    sequence reaches). Values are 64-bit; equal bins estimate Jaccard."""
    h = _mix64(hashes)
    bins = (h % np.uint64(k)).astype(np.int64)
    values = h // np.uint64(k)
    out = np.full(k, np.iinfo(np.uint64).max, dtype=np.uint64)
    np.minimum.at(out, bins, values)
    empty = out == np.iinfo(np.uint64).max
    if empty.all() or not empty.any():
        return out
    filled = out.copy()
    for j in np.flatnonzero(empty):
        attempt = 1
        while True:
            probe = int(_mix64(np.array([j * 1_000_003 + attempt], dtype=np.uint64))[0] % k)
            if not empty[probe]:
                filled[j] = out[probe]
                break
            attempt += 1
    return filled


def part3(n: int) -> None:
    from datasketch import MinHash

    docs = corpus(n)
    hashes = {key: dup.shingle_hashes(dup.words(text)) for key, _f, text in docs}
    exact_sets = {key: set(h.tolist()) for key, h in hashes.items()}
    families: dict[str, list[str]] = {}
    for key, family, _text in docs:
        families.setdefault(family, []).append(key)
    pairs = [(a, b) for fam, keys in families.items() if fam not in ("single",)
             for i, a in enumerate(keys) for b in keys[i + 1:]
             if fam != "decoy" or (hash(a + b) % 40 == 0)]  # a sample of decoy pairs
    truth = {p: len(exact_sets[p[0]] & exact_sets[p[1]]) /
             len(exact_sets[p[0]] | exact_sets[p[1]]) for p in pairs}

    def reference(h: np.ndarray) -> np.ndarray:
        m = MinHash(num_perm=dup.NUM_PERM, seed=dup.SEED, scheme=dup.SCHEME, hashfunc=int)
        m.update_batch(h.tolist())
        return m.hashvalues

    methods = {
        "gate: 256 permutations, numpy blocks": dup.sketch_values,
        "datasketch update_batch (same values)": reference,
        "first 128 of 256 (cost is of 256)": lambda h: dup.sketch_values(h)[:128],
        "one permutation, densified, 256 bins": oph_densified,
    }
    print(f"sketches: {len(docs)} documents, {len(pairs)} pairs "
          f"({sum(j >= 0.85 for j in truth.values())} at J >= 0.85, "
          f"{sum(j < 0.5 for j in truth.values())} below 0.5)")
    for name, method in methods.items():
        started = time.process_time()
        sketches = {key: method(h) for key, h in hashes.items()}
        cost = (time.process_time() - started) / len(docs) * 1000
        big = np.random.default_rng(2).integers(0, 2**32, size=(20, 8000),
                                                dtype=np.uint64).astype(np.uint32)
        started = time.process_time()
        for h in big:
            method(h)
        cost_big = (time.process_time() - started) / len(big) * 1000
        errors, found, high, false, low = [], 0, 0, 0, 0
        for (a, b), j in truth.items():
            estimate = float(np.mean(sketches[a] == sketches[b]))
            errors.append(abs(estimate - j))
            if j >= 0.85:
                high += 1
                found += estimate >= 0.80
            if j < 0.5:
                low += 1
                false += estimate >= 0.80
        print(f"  {name:40s} {cost:6.3f} ms/doc CPU ({cost_big:5.2f} ms at 8,000 shingles, a "
              f"bench-mix page), mean |error| {np.mean(errors):.4f}, "
              f"J>=0.85 estimated >=0.80: {found / max(high, 1):.4f}, J<0.5 estimated "
              f">=0.80: {false}/{low}")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=2400)
    parser.add_argument("--index", type=int, nargs="*", default=[10_000, 100_000])
    parser.add_argument("--sketches", action="store_true",
                        help="only part 3: sketch alternatives against exact Jaccard")
    args = parser.parse_args()
    if args.sketches:
        part3(args.docs)
        return
    part1(args.docs)
    part2(args.index)


if __name__ == "__main__":
    main()
