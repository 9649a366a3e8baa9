"""Terminology benchmark on the English->French UI-string model (from bench/bench_train.py).

1. Mines a glossary from the training catalogs: single-word pairs with a high Dice coefficient
   (2 c(e, f) / (c(e) + c(f)) over co-occurrence in sentence pairs; Dice 1945, as used for bilingual term
   extraction by Smadja et al. 1996), kept only when the test references really use the target where the
   source has the term (so the glossary is right for this test set), at least ``--terms`` of them.
2. Translates the test segments that contain a glossary term with term mode off, prefer and enforce, and
   reports term accuracy (exact match, Dinu et al. 2019), BLEU and chrF (sacrebleu), and the decoding-speed
   overhead of matching and constraints against mode off.

    python bench/bench_terms.py [--language fr] [--terms 120] [--segments 300]
"""

from __future__ import annotations

import argparse
import sys
import time
from collections import Counter
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

from bench.bench_train import model_dir_for  # noqa: E402
from bench.common import REPO, commit, machine, replace_readme_rows, replace_section, ui_corpus  # noqa: E402
from decoder.errors import InvalidTextError  # noqa: E402
from decoder.search.settings import TranslationOptions  # noqa: E402
from decoder.search.translator import Translator  # noqa: E402
from decoder.terminology import read_glossary_file, term_accuracy  # noqa: E402
from decoder.text.pipeline import model_tokens  # noqa: E402
from decoder.translation_model import load_translation_model  # noqa: E402

MIN_COUNT = 5
MIN_DICE = 0.6
MIN_TEST_AGREEMENT = 0.8  # share of test pairs with the source term whose reference has the target


def content_words(text: str, language: str) -> set[str]:
    try:
        tokens = model_tokens(text, language)
    except InvalidTextError:  # catalog strings with control characters: training drops them too
        return set()
    return {token for token in tokens if token.isalpha() and len(token) >= 4}


def mine_glossary(folder: Path, language: str, wanted: int) -> list[tuple[str, str, int]]:
    sources = (folder / "train.en").read_text(encoding="utf-8").splitlines()
    targets = (folder / f"train.{language}").read_text(encoding="utf-8").splitlines()
    source_counts: Counter[str] = Counter()
    target_counts: Counter[str] = Counter()
    pair_counts: Counter[tuple[str, str]] = Counter()
    for source, target in zip(sources, targets):
        source_words, target_words = content_words(source, "en"), content_words(target, language)
        source_counts.update(source_words)
        target_counts.update(target_words)
        pair_counts.update((e, f) for e in source_words for f in target_words)
    best: dict[str, tuple[float, str]] = {}
    for (e, f), count in pair_counts.items():
        if count < MIN_COUNT:
            continue
        dice = 2 * count / (source_counts[e] + target_counts[f])
        if dice >= MIN_DICE and dice > best.get(e, (0.0, ""))[0]:
            best[e] = (dice, f)
    test_sources = (folder / "test.en").read_text(encoding="utf-8").splitlines()
    test_references = (folder / f"test.{language}").read_text(encoding="utf-8").splitlines()
    uses: Counter[str] = Counter()
    agrees: Counter[str] = Counter()
    for source, reference in zip(test_sources, test_references):
        source_words, reference_words = content_words(source, "en"), content_words(reference, language)
        for e in source_words & best.keys():
            uses[e] += 1
            agrees[e] += best[e][1] in reference_words
    kept = [(e, best[e][1], uses[e]) for e in uses if agrees[e] / uses[e] >= MIN_TEST_AGREEMENT]
    kept.sort(key=lambda item: (-item[2], item[0]))
    return kept[:max(wanted, 100)]


def main() -> None:
    import sacrebleu

    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--language", default="fr")
    parser.add_argument("--terms", type=int, default=120)
    parser.add_argument("--segments", type=int, default=300)
    args = parser.parse_args()
    folder = ui_corpus(args.language)
    terms = mine_glossary(folder, args.language, args.terms)
    glossary_path = REPO / "bench" / "work" / f"ui-terms-en-{args.language}.tsv"
    glossary_path.parent.mkdir(parents=True, exist_ok=True)
    glossary_path.write_text("source\ttarget\tstatus\n" + "".join(f"{e}\t{f}\tpreferred\n" for e, f, _ in terms),
                             encoding="utf-8")
    glossary = read_glossary_file(glossary_path, "en", args.language)
    translator = Translator(load_translation_model(model_dir_for(args.language)))
    sources = (folder / "test.en").read_text(encoding="utf-8").splitlines()
    references = (folder / f"test.{args.language}").read_text(encoding="utf-8").splitlines()
    chosen = [k for k, source in enumerate(sources)
              if term_accuracy([source], [""], [glossary], "en", args.language).num_terms][:args.segments]
    sample_sources = [sources[k] for k in chosen]
    sample_references = [references[k] for k in chosen]
    rows = {}
    for mode in ("off", "prefer", "enforce"):
        options = TranslationOptions(glossaries=(glossary,), term_mode=mode)
        started = time.perf_counter()
        outputs = [result.translation for result in translator.translate(sample_sources, options)]
        seconds = time.perf_counter() - started
        accuracy = term_accuracy(sample_sources, outputs, [glossary], "en", args.language)
        rows[mode] = {"seconds": seconds, "accuracy": accuracy.rate, "num_terms": accuracy.num_terms,
                      "bleu": sacrebleu.corpus_bleu(outputs, [sample_references]).score,
                      "chrf": sacrebleu.corpus_chrf(outputs, [sample_references]).score}
    started = time.perf_counter()
    plain = [result.translation for result in translator.translate(sample_sources)]
    plain_seconds = time.perf_counter() - started
    plain_bleu = sacrebleu.corpus_bleu(plain, [sample_references]).score

    command = f"python bench/bench_terms.py --language {args.language} --terms {args.terms} " \
              f"--segments {args.segments}"
    lines = ["## Terminology (English->French UI strings)", "", f"Commit {commit()}, {machine()}. Command: "
             f"`{command}`.", "",
             f"Glossary: {len(terms)} single-word terms mined from the training catalogs (Dice >= {MIN_DICE}, "
             f"co-occurrence >= {MIN_COUNT}, target used in >= {MIN_TEST_AGREEMENT:.0%} of the test references "
             f"where the source has the term); written to `{glossary_path.relative_to(REPO)}`. Test segments with "
             f"a glossary term: {len(chosen)} ({rows['enforce']['num_terms']} term occurrences).", "",
             "| term mode | term accuracy | BLEU | chrF | seconds | overhead vs no glossary |",
             "|---|---|---|---|---|---|",
             f"| no glossary | | {plain_bleu:.2f} | | {plain_seconds:.1f} | |"]
    for mode, row in rows.items():
        lines.append(f"| {mode} | {100 * row['accuracy']:.1f}% | {row['bleu']:.2f} | {row['chrf']:.2f} | "
                     f"{row['seconds']:.1f} | {100 * (row['seconds'] / plain_seconds - 1):+.0f}% |")
    lines += ["", "Targets: enforce 100% of applicable terms, prefer at least 95%, BLEU not below glossary-off, "
              "overhead under 10%."]
    replace_section("terms", "\n".join(lines))
    replace_readme_rows("terms", [
        "| glossary | segments | mode | term accuracy | BLEU | overhead | machine | commit |",
        "|---|---|---|---|---|---|---|---|",
        *[f"| {len(terms)} mined terms | {len(chosen)} | {mode} | {100 * row['accuracy']:.1f}% | {row['bleu']:.2f} "
          f"| {100 * (row['seconds'] / plain_seconds - 1):+.0f}% | {machine()} | {commit()} |"
          for mode, row in rows.items()]])
    print("\n".join(lines))


if __name__ == "__main__":
    main()
