"""`phrasework ...`: parses arguments, calls the library, prints results. No MT logic lives here.

Errors the library raises on purpose (DecoderError) are printed as one line on stderr with exit status 2;
nothing prints a traceback at the user.
"""

from __future__ import annotations

import argparse
import os
import sys
import time
from collections.abc import Sequence
from pathlib import Path

from tqdm.auto import tqdm

from decoder.align.aligner import AlignmentSettings, align_corpus
from decoder.align.links import format_links
from decoder.align.symmetrize import SYMMETRIZATION_METHODS
from decoder.corpus.cleaning import CleaningRules
from decoder.corpus.reader import CORPUS_FORMATS, detect_format
from decoder.errors import DecoderError
from decoder.executor import make_executor
from decoder.search.settings import TranslationOptions
from decoder.training_data import read_training_data

EXIT_USAGE = 2
DEFAULT_GLOSSARY_DIR = Path("glossaries")


def _add_corpus_arguments(parser: argparse.ArgumentParser) -> None:
    parser.add_argument("--source-file", required=True, type=Path,
                        help="source side: a plain text file, or the whole corpus for tsv/tmx/po/mo")
    parser.add_argument("--target-file", type=Path, help="target side (plain format only)")
    parser.add_argument("--source-lang", default="und", help="BCP 47 tag of the source language, e.g. en")
    parser.add_argument("--target-lang", default="und", help="BCP 47 tag of the target language, e.g. es")
    parser.add_argument("--corpus-format", choices=CORPUS_FORMATS,
                        help="default: from the file extension (.tsv .tmx .po .mo), else plain")
    parser.add_argument("--max-tokens", type=int, default=80, help="drop pairs with a longer side (default 80)")
    parser.add_argument("--max-length-ratio", type=float, default=9.0,
                        help="drop pairs whose longer side is more than this many times the shorter (default 9)")
    parser.add_argument("--workers", type=int, default=os.cpu_count() or 1,
                        help="worker processes for the map steps (default: all cores)")


def _add_alignment_arguments(parser: argparse.ArgumentParser) -> None:
    parser.add_argument("--model1-iterations", type=int, default=5)
    parser.add_argument("--hmm-iterations", type=int, default=5)
    parser.add_argument("--symmetrize", choices=SYMMETRIZATION_METHODS, default="grow-diag-final-and")


def _add_glossary_arguments(parser: argparse.ArgumentParser, with_mode: bool = True) -> None:
    parser.add_argument("--glossary", action="append", metavar="NAME_OR_FILE",
                        help="a glossary by name (a file in the glossary folder) or path; repeatable")
    parser.add_argument("--glossary-dir", type=Path, help=f"where glossary names are looked up "
                                                          f"(default {DEFAULT_GLOSSARY_DIR})")
    if with_mode:
        parser.add_argument("--term-mode", choices=("enforce", "prefer", "off"), default="enforce",
                            help="how matched terms are applied (entries may set their own)")


def _alignment_settings(args: argparse.Namespace) -> AlignmentSettings:
    try:
        return AlignmentSettings(args.model1_iterations, args.hmm_iterations, symmetrization=args.symmetrize)
    except ValueError as error:
        raise DecoderError(str(error)) from error


def _read_corpus(args: argparse.Namespace, executor, keep_cased_target: bool = False):
    corpus_format = args.corpus_format or detect_format(args.source_file)
    target_file = args.target_file if corpus_format == "plain" else None
    if corpus_format != "plain" and args.target_file is not None:
        raise DecoderError(f"--target-file is only for the plain format; {corpus_format} holds both sides")
    return read_training_data(
        args.source_file, target_file, args.source_lang, args.target_lang, corpus_format=corpus_format,
        rules=CleaningRules(args.max_tokens, args.max_length_ratio), executor=executor, show_progress=True,
        keep_cased_target=keep_cased_target)


def _print_alignment_summary(result, seconds: float) -> None:
    for direction in (result.forward, result.backward):
        for history in direction.histories:
            for report in history.iterations:
                print(f"{history.stage} iteration {report.iteration}: perplexity {report.perplexity:.3f}, "
                      f"log-likelihood {report.log_likelihood:.1f}, {report.seconds:.2f} s", file=sys.stderr)
    print(f"links after symmetrization: {len(result.symmetrized.links)}; alignment took {seconds:.1f} s",
          file=sys.stderr)


def _show_examples(data, alignments, count: int) -> None:
    for pair in range(min(count, len(data.corpus))):
        source = data.source_vocabulary.decode(data.corpus.source[pair])
        target = data.target_vocabulary.decode(data.corpus.target[pair])
        links = sorted(alignments.link_set(pair))
        print(f"\npair {int(data.pair_indices[pair]) + 1}")
        print(f"  source: {' '.join(source)}")
        print(f"  target: {' '.join(target)}")
        print("  links:  " + "  ".join(f"{source[i]}={target[j]}" for i, j in links))


def command_align(args: argparse.Namespace) -> int:
    settings = _alignment_settings(args)
    started = time.perf_counter()
    executor = make_executor(args.workers)
    try:
        data = _read_corpus(args, executor)
        for line in data.summary_lines():
            print(line, file=sys.stderr)
        result = align_corpus(data.corpus, len(data.source_vocabulary), len(data.target_vocabulary), settings,
                              executor=executor, show_progress=True)
    finally:
        executor.close()
    lines = [""] * data.num_input_pairs
    for kept, position in enumerate(data.pair_indices):
        lines[position] = format_links(result.symmetrized[kept])
    args.out.parent.mkdir(parents=True, exist_ok=True)
    args.out.write_text("".join(line + "\n" for line in lines), encoding="utf-8")
    _print_alignment_summary(result, time.perf_counter() - started)
    print(f"wrote {len(lines)} lines to {args.out}", file=sys.stderr)
    if args.show:
        _show_examples(data, result.symmetrized, args.show)
    return 0


def command_train(args: argparse.Namespace) -> int:
    from decoder.phrases.settings import PhraseSettings
    from decoder.training import TrainingSettings, train_model

    corpus_format = args.corpus_format or detect_format(args.source_file)
    if corpus_format != "plain" and args.target_file is not None:
        raise DecoderError(f"--target-file is only for the plain format; {corpus_format} holds both sides")
    try:
        settings = TrainingSettings(
            cleaning=CleaningRules(args.max_tokens, args.max_length_ratio), alignment=_alignment_settings(args),
            phrases=PhraseSettings(max_phrase_length=args.max_phrase_length,
                                   max_targets_per_source=args.max_targets_per_source,
                                   drop_singletons=args.drop_singletons),
            lm_order=args.lm_order, workers=args.workers)
    except ValueError as error:
        raise DecoderError(str(error)) from error
    if not 1 <= args.lm_order <= 5:
        raise DecoderError("--lm-order must be between 1 and 5")
    summary = train_model(args.source_file, args.target_file if corpus_format == "plain" else None,
                          args.source_lang, args.target_lang, args.out, corpus_format=corpus_format,
                          lm_files=args.lm_file, settings=settings, force=args.force, show_progress=True)
    for line in summary.lines():
        print(line, file=sys.stderr)
    return 0


def command_phrases(args: argparse.Namespace) -> int:
    from decoder.text.pipeline import prepare_segment
    from decoder.translation_model import load_translation_model

    model = load_translation_model(args.model)
    tokens = prepare_segment(args.source, model.source_language).model_tokens
    ids = model.source_vocabulary.encode(tokens)
    table = model.phrase_table
    rows = table.lookup(ids)
    if not rows:
        print(f"no phrase pairs for source phrase {' '.join(tokens)!r}", file=sys.stderr)
        return 1
    header = ["target", *table.SCORE_NAMES, *table.REORDERING_NAMES, "alignment", "count"]
    print("\t".join(header))
    ordered = sorted(rows, key=lambda row: -float(table.scores[row, 0]))[: args.limit]
    for row in ordered:
        target = " ".join(model.target_vocabulary.decode(table.target_phrase(row)))
        values = [f"{float(value):.4f}" for value in (*table.scores[row], *table.reordering[row])]
        links = " ".join(f"{int(i)}-{int(j)}" for i, j in table.alignment(row))
        print("\t".join([target, *values, links, str(int(table.pair_counts[row]))]))
    return 0


def _parse_weights(items: Sequence[str]) -> dict[str, float]:
    weights = {}
    for item in items:
        name, sep, value = item.partition("=")
        try:
            weights[name.strip()] = float(value)
        except ValueError:
            raise DecoderError(f"--weight takes NAME=NUMBER, got {item!r}") from None
        if not sep:
            raise DecoderError(f"--weight takes NAME=NUMBER, got {item!r}")
    return weights


def _translation_options(args: argparse.Namespace, model) -> TranslationOptions:
    search = model.search_defaults.with_overrides(**{
        name: value for name, value in (
            ("algorithm", args.algorithm), ("stack_size", args.stack_size), ("beam_width", args.beam_width),
            ("distortion_limit", args.distortion_limit), ("cube_pop_limit", args.cube_pop_limit),
            ("max_options_per_span", args.max_options_per_span)) if value is not None})
    include = set(args.include or ())
    return TranslationOptions(n_best=args.n_best, search=search, weights=_parse_weights(args.weight) or None,
                              include_segmentation="segmentation" in include,
                              include_alignment="alignment" in include,
                              max_segment_tokens=args.max_segment_tokens,
                              glossaries=_load_glossaries(args, model.source_language, model.target_language),
                              term_mode=args.term_mode)


def _load_glossaries(args: argparse.Namespace, source_language: str, target_language: str) -> tuple:
    from decoder.terminology import load_glossary

    search_dirs = (args.glossary_dir,) if getattr(args, "glossary_dir", None) else (DEFAULT_GLOSSARY_DIR,)
    return tuple(load_glossary(name, source_language, target_language, search_dirs=search_dirs)
                 for name in getattr(args, "glossary", None) or ())


def command_translate(args: argparse.Namespace) -> int:
    from decoder.batch_translation import translate_lines, use_translator
    from decoder.search.translator import Translator
    from decoder.translation_model import load_translation_model

    model = load_translation_model(args.model)
    options = _translation_options(args, model)
    use_translator(Translator(model))
    executor = make_executor(args.workers)  # forks after the model is mapped: workers share it
    failures = 0
    output = sys.stdout
    progress = tqdm(desc="translating", unit=" lines", disable=output.isatty(), file=sys.stderr)
    try:
        for result in translate_lines(sys.stdin.buffer, options, args.format, executor):
            output.write(result.text + "\n")
            progress.update(1)
            if result.error is not None:
                failures += 1
                print(f"phrasework: line {result.line_number}: {result.error}", file=sys.stderr)
        output.flush()
    finally:
        progress.close()
        executor.close()
    print(f"translated {progress.n} lines ({failures} with errors)", file=sys.stderr)
    return 1 if failures else 0


def _read_lines(path: Path) -> list[str]:
    from decoder.corpus.lines import iter_lines

    return [text for _, text in iter_lines(path)]


def command_tune(args: argparse.Namespace) -> int:
    from decoder.tuning.model_tuning import tune_model

    sources, references = _read_lines(args.dev_source), _read_lines(args.dev_reference)
    if len(sources) != len(references):
        raise DecoderError(f"{args.dev_source} has {len(sources)} lines but {args.dev_reference} has "
                           f"{len(references)}; they must be line-aligned")
    result, plot = tune_model(args.model, sources, references, method=args.method, max_iterations=args.iterations,
                              n_best=args.n_best, workers=args.workers, seed=args.seed, show_progress=True)
    for record in result.history:
        print(f"iteration {record.iteration}: dev BLEU {100 * record.dev_bleu:.2f} "
              f"({record.num_pool_entries} pooled hypotheses, {record.seconds:.1f} s)", file=sys.stderr)
    print(f"best: iteration {result.best_iteration + 1}, dev BLEU {100 * result.best_dev_bleu:.2f}; stopped: "
          f"{result.stop_reason}; weights written to {args.model / 'manifest.json'}; plot {plot}", file=sys.stderr)
    return 0


def command_evaluate(args: argparse.Namespace) -> int:
    import json

    from decoder.evaluation import evaluate_model
    from decoder.translation_model import load_translation_model

    sources, references = _read_lines(args.source), _read_lines(args.reference)
    model = load_translation_model(args.model)
    glossaries = _load_glossaries(args, model.source_language, model.target_language)
    options = TranslationOptions(glossaries=glossaries, term_mode=args.term_mode)
    report = evaluate_model(args.model, sources, references, workers=args.workers, options=options)
    if args.json:
        print(json.dumps(report.to_dict(), ensure_ascii=False))
    else:
        print("\n".join(report.lines()))
    return 0


def command_glossary_check(args: argparse.Namespace) -> int:
    from decoder.terminology import check_glossary

    check = check_glossary(args.file, args.source_lang, args.target_lang)
    print(f"{check.path}: glossary {check.name!r}")
    print(f"  entries: {check.num_entries} ({check.num_multi_word_entries} multi-word, "
          f"{check.num_case_sensitive_entries} case-sensitive)")
    print(f"  target terms: {check.num_target_alternatives}; forbidden (deprecated/superseded): "
          f"{check.num_forbidden_terms}; entries that can never match: {check.num_unmatchable_entries}")
    for warning in check.warnings:
        print(f"  warning: {warning.origin}: {warning.message}")
    return 0 if check.is_clean else 1


def command_serve(args: argparse.Namespace, extra: Sequence[str]) -> int:
    """Hand over to the service launcher (``python -m service.launcher``), which execs gunicorn. The library does
    not import the web layer; the launcher validates the arguments and prints its own errors."""
    os.execv(sys.executable, [sys.executable, "-m", "service.launcher", *extra])
    return 0  # not reached


def build_parser() -> argparse.ArgumentParser:
    parser = argparse.ArgumentParser(prog="phrasework", description="Statistical phrase-based machine translation.")
    commands = parser.add_subparsers(dest="command", required=True, metavar="COMMAND")

    align = commands.add_parser("align", help="word-align a parallel corpus (IBM Model 1 + HMM, both directions)",
                                description="Write one line per input pair: links i-j (source-target, 0-based).")
    _add_corpus_arguments(align)
    _add_alignment_arguments(align)
    align.add_argument("--out", required=True, type=Path, help="alignment file to write")
    align.add_argument("--show", type=int, default=0, metavar="N", help="print the first N aligned pairs")
    align.set_defaults(handler=command_align)

    train = commands.add_parser("train", help="train a phrase-based model from a parallel corpus",
                                description="Clean, align, extract and score phrases, train the LM, write MODEL_DIR.")
    _add_corpus_arguments(train)
    _add_alignment_arguments(train)
    train.add_argument("--out", required=True, type=Path, help="model directory to create")
    train.add_argument("--lm-file", type=Path, action="append", default=[],
                       help="extra target-language text for the language model (repeatable)")
    train.add_argument("--lm-order", type=int, default=5, help="n-gram order of the language model (1-5)")
    train.add_argument("--max-phrase-length", type=int, default=7, help="tokens per phrase side (default 7)")
    train.add_argument("--max-targets-per-source", type=int, default=20,
                       help="target phrases kept per source phrase (default 20)")
    train.add_argument("--drop-singletons", action="store_true", help="drop phrase pairs seen only once")
    train.add_argument("--force", action="store_true", help="replace an existing model directory")
    train.set_defaults(handler=command_train)

    translate = commands.add_parser(
        "translate", help="translate stdin to stdout, one line per line",
        description="Reads raw text, one segment per line, and writes one output line per input line, always. "
                    "Machine translations are drafts: have them reviewed by a qualified translator before "
                    "publication, above all for safety, medical, legal or regulatory text.")
    translate.add_argument("--model", required=True, type=Path, metavar="MODEL_DIR")
    translate.add_argument("--n-best", type=int, default=1, help="translations per segment (jsonl shows them)")
    translate.add_argument("--format", choices=("text", "jsonl"), default="text")
    translate.add_argument("--include", action="append", choices=("segmentation", "alignment"),
                           help="with --format jsonl: add phrase segmentation and/or word alignment")
    translate.add_argument("--workers", type=int, default=1, help="worker processes (default 1)")
    translate.add_argument("--algorithm", choices=("cube", "stack"))
    translate.add_argument("--stack-size", type=int)
    translate.add_argument("--beam-width", type=float)
    translate.add_argument("--distortion-limit", type=int, help="0: monotone; negative: unlimited")
    translate.add_argument("--cube-pop-limit", type=int)
    translate.add_argument("--max-options-per-span", type=int)
    translate.add_argument("--max-segment-tokens", type=int, default=150,
                           help="longer segments are split at punctuation and translated piece by piece")
    translate.add_argument("--weight", action="append", default=[], metavar="NAME=VALUE",
                           help="override one feature weight (repeatable)")
    _add_glossary_arguments(translate)
    translate.set_defaults(handler=command_translate)

    tune = commands.add_parser("tune", help="tune the feature weights on a dev set (MERT or PRO)",
                               description="Decodes the dev set repeatedly, optimises the weights and writes the best "
                                           "ones into the model's manifest (with the previous weights and a history) "
                                           "and a plot of dev BLEU per iteration (tuning.png) next to it.")
    tune.add_argument("--model", required=True, type=Path, metavar="MODEL_DIR")
    tune.add_argument("--dev-source", required=True, type=Path)
    tune.add_argument("--dev-reference", required=True, type=Path)
    tune.add_argument("--method", choices=("mert", "pro"), default="mert")
    tune.add_argument("--iterations", type=int, default=10, help="at most this many decodes (default 10)")
    tune.add_argument("--n-best", type=int, default=100)
    tune.add_argument("--workers", type=int, default=os.cpu_count() or 1)
    tune.add_argument("--seed", type=int, default=0)
    tune.set_defaults(handler=command_tune)

    evaluate = commands.add_parser("evaluate", help="translate a test set and report BLEU, chrF and more")
    evaluate.add_argument("--model", required=True, type=Path, metavar="MODEL_DIR")
    evaluate.add_argument("--source", required=True, type=Path)
    evaluate.add_argument("--reference", required=True, type=Path)
    evaluate.add_argument("--workers", type=int, default=1)
    evaluate.add_argument("--json", action="store_true", help="one JSON object instead of text")
    _add_glossary_arguments(evaluate)
    evaluate.set_defaults(handler=command_evaluate)

    glossary = commands.add_parser("glossary", help="glossary tools")
    glossary_commands = glossary.add_subparsers(dest="glossary_command", required=True, metavar="COMMAND")
    check = glossary_commands.add_parser("check", help="validate a glossary file (TSV, CSV or TBX) and show statistics")
    check.add_argument("file", type=Path)
    check.add_argument("--source-lang", required=True, help="BCP 47 tag of the source language")
    check.add_argument("--target-lang", required=True, help="BCP 47 tag of the target language")
    check.set_defaults(handler=command_glossary_check)

    serve = commands.add_parser(
        "serve", add_help=False, help="serve models over HTTP (JSON REST, gunicorn)",
        description="Arguments: --model MODEL_DIR [--model ...] [--glossary-dir DIR] [--database FILE] "
                    "[--bind 127.0.0.1:8080] [--workers N] [--api-keys-file FILE]; see service/README.md.")
    serve.set_defaults(handler=command_serve, passes_arguments_through=True)

    phrases = commands.add_parser("phrases", help="print the phrase pairs of a source phrase")
    phrases.add_argument("model", type=Path, metavar="MODEL_DIR")
    phrases.add_argument("--source", required=True, help="the source phrase (raw text; tokenized as in training)")
    phrases.add_argument("--limit", type=int, default=20, help="at most this many pairs (best phrase_fwd first)")
    phrases.set_defaults(handler=command_phrases)
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    argv = list(sys.argv[1:] if argv is None else argv)
    if argv[:1] == ["serve"]:  # everything after "serve" belongs to the service launcher
        return command_serve(argparse.Namespace(), argv[1:])
    args = build_parser().parse_args(argv)
    try:
        return args.handler(args)
    except DecoderError as error:
        print(f"phrasework: error: {error}", file=sys.stderr)
        return EXIT_USAGE
    except KeyboardInterrupt:
        print("phrasework: interrupted", file=sys.stderr)
        return 130


if __name__ == "__main__":
    sys.exit(main())
