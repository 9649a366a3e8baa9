"""Read and write n-gram models in the ARPA back-off text format.

Layout: optional lines before ``\\data\\``; ``\\data\\`` followed by one ``ngram k=COUNT`` line per order; one
section per order, ``\\k-grams:``, whose lines are ``log10_prob w1 .. wk [log10_backoff]`` (fields separated by
tabs or spaces); ``\\end\\``. A missing back-off weight means log10 0. Token strings map to our ids through a
Vocabulary; ``<unk>``, ``<s>`` and ``</s>`` are the reserved ids of ``decoder.vocabulary``.
"""

from __future__ import annotations

import re
from collections import defaultdict
from dataclasses import dataclass, field
from pathlib import Path

import numpy as np
import numpy.typing as npt

from decoder.errors import InputFileError
from decoder.lm.counts import sort_rows
from decoder.lm.ngram_model import NEVER_LOG10, NgramModel, complete_ngram_model
from decoder.vocabulary import (
    SENTENCE_END_ID,
    SENTENCE_START_ID,
    SPECIAL_TOKENS,
    UNKNOWN_ID,
    Vocabulary,
)

NUMBER_FORMAT = ".7g"  # 7 significant digits, about what the float32 arrays of decoder.lm.query keep
_COUNT_LINE = re.compile(r"^ngram\s+(\d+)\s*=\s*(\d+)$")
_SECTION_LINE = re.compile(r"^\\(\d+)-grams:$")


def write_arpa(model: NgramModel, vocabulary: Vocabulary, path: str | Path) -> None:
    """Write ``model`` with token strings from ``vocabulary``; back-off weights are written where not log10 0.

    Every id of the model must have a token in ``vocabulary`` (ValueError otherwise)."""
    if model.vocabulary_size > len(vocabulary):
        raise ValueError(f"model has {model.vocabulary_size} word ids, vocabulary only {len(vocabulary)}")
    tokens = vocabulary.tokens
    with open(path, "w", encoding="utf-8", newline="\n") as out:
        out.write("\\data\\\n")
        for k in range(1, model.order + 1):
            out.write(f"ngram {k}={model.num_ngrams(k)}\n")
        texts: list[str] = []
        for k in range(1, model.order + 1):
            out.write(f"\n\\{k}-grams:\n")
            last_words = model.ngrams[k - 1][:, -1].tolist()
            if k == 1:
                texts = [tokens[word] for word in last_words]
            else:  # the text of h w is the text of its prefix row h, a space and w
                prefix_rows = (model.keys[k - 1] // model.vocabulary_size).tolist()
                texts = [texts[row] + " " + tokens[word] for row, word in zip(prefix_rows, last_words, strict=True)]
            probs = model.log10_probs[k - 1].tolist()
            if k == model.order:
                out.writelines([f"{prob:{NUMBER_FORMAT}}\t{text}\n" for prob, text in zip(probs, texts, strict=True)])
                continue
            backoffs = model.log10_backoffs[k - 1].tolist()
            out.writelines(
                [
                    f"{prob:{NUMBER_FORMAT}}\t{text}\t{backoff:{NUMBER_FORMAT}}\n"
                    if backoff != 0.0
                    else f"{prob:{NUMBER_FORMAT}}\t{text}\n"
                    for prob, text, backoff in zip(probs, texts, backoffs, strict=True)
                ]
            )
        out.write("\n\\end\\\n")


@dataclass(slots=True)
class _Section:
    """One ``\\k-grams:`` section as read: the fields as strings, converted in bulk afterwards."""

    order: int
    first_line: int
    probs: list[str] = field(default_factory=list)
    backoffs: list[str] = field(default_factory=list)
    words: list[str] = field(default_factory=list)  # order words per entry, flat
    line_numbers: list[int] = field(default_factory=list)


def _read_sections(path: str | Path) -> tuple[list[_Section], int]:
    """The sections of an ARPA file, checked against its ``\\data\\`` counts; and the number of its last line."""
    declared: dict[int, int] = {}
    sections: list[_Section] = []
    state = "preamble"
    k = 0
    line_number = 0

    def check_count(section: _Section, at_line: int) -> None:
        if len(section.probs) != declared[section.order]:
            raise InputFileError(
                path,
                f"\\{section.order}-grams: has {len(section.probs)} entries but \\data\\ declares "
                f"{declared[section.order]}",
                at_line,
            )

    with open(path, encoding="utf-8") as lines:
        for line_number, raw in enumerate(lines, start=1):
            fields = raw.split()
            num_fields = len(fields)
            if state == "ngrams" and (num_fields == k + 1 or num_fields == k + 2):  # the hot path
                section = sections[-1]
                section.probs.append(fields[0])
                if num_fields == k + 1:
                    section.backoffs.append("0")
                    section.words.extend(fields[1:])
                else:
                    section.backoffs.append(fields[-1])
                    section.words.extend(fields[1:-1])
                section.line_numbers.append(line_number)
                continue
            if state == "end" or not fields:
                continue
            line = raw.strip()
            if state == "preamble":
                if line == "\\data\\":
                    state = "counts"
                continue
            if line == "\\end\\":
                if not sections:
                    raise InputFileError(path, "\\end\\ before any n-gram section", line_number)
                state = "end"
                continue
            header = _SECTION_LINE.match(line)
            if header:
                k = int(header.group(1))
                if k != len(sections) + 1 or k not in declared:
                    raise InputFileError(
                        path,
                        f"unexpected section \\{k}-grams: (expected \\{len(sections) + 1}-grams: as declared "
                        "under \\data\\)",
                        line_number,
                    )
                if sections:
                    check_count(sections[-1], line_number)
                sections.append(_Section(k, line_number))
                state = "ngrams"
                continue
            if state == "counts":
                count = _COUNT_LINE.match(line)
                if not count:
                    raise InputFileError(
                        path, f"expected 'ngram k=COUNT' under \\data\\, got {line[:60]!r}", line_number
                    )
                order, value = int(count.group(1)), int(count.group(2))
                if order != len(declared) + 1:
                    raise InputFileError(
                        path,
                        f"ngram counts must be listed for orders 1, 2, ... in turn; got order {order}",
                        line_number,
                    )
                declared[order] = value
                continue
            raise InputFileError(
                path,
                f"a {k}-gram line needs a log10 probability, {k} words and an optional log10 back-off; got "
                f"{num_fields} fields",
                line_number,
            )
    if state == "preamble":
        raise InputFileError(path, "no \\data\\ line: not an ARPA file", max(line_number, 1))
    if state != "end":
        raise InputFileError(path, "file ends before \\end\\", max(line_number, 1))
    if len(sections) != len(declared):
        raise InputFileError(
            path, f"\\data\\ declares {len(declared)} orders but the file has {len(sections)} sections", line_number
        )
    check_count(sections[-1], line_number)
    return sections, line_number


def _log10_values(path: str | Path, texts: list[str], line_numbers: list[int], what: str) -> npt.NDArray[np.float64]:
    """The texts as float64 log10 values; InputFileError at the first that is not a number or is above 0."""
    try:
        values = np.array(texts, dtype=np.float64)
    except ValueError:
        for text, line_number in zip(texts, line_numbers, strict=True):
            try:
                float(text)
            except ValueError:
                raise InputFileError(path, f"{what} {text!r} is not a number", line_number) from None
        raise
    is_bad = np.isnan(values) | (values > 0.0)
    if is_bad.any():
        first = int(np.flatnonzero(is_bad)[0])
        raise InputFileError(path, f"{what} {texts[first]!r} must be a log10 value of at most 0", line_numbers[first])
    return values


def read_arpa(path: str | Path) -> tuple[NgramModel, Vocabulary]:
    """The model in an ARPA file and a Vocabulary built from its unigram section (special tokens keep their
    reserved ids, other words get ids in file order).

    ``<unk>``, ``<s>`` or ``</s>`` missing from the unigrams are added with log10 prob NEVER_LOG10; missing
    prefixes and suffixes of listed n-grams are added without changing any probability
    (``complete_ngram_model``). A back-off weight on a highest-order line is ignored (it never applies).
    Malformed lines, counts that disagree with ``\\data\\``, duplicates and words without a unigram raise
    InputFileError naming the file and line."""
    sections, last_line = _read_sections(path)
    order = len(sections)
    unigrams = sections[0]
    first_line: dict[str, int] = {}
    for word, line_number in zip(unigrams.words, unigrams.line_numbers, strict=True):
        if word in first_line:
            raise InputFileError(path, f"unigram {word!r} listed twice (first on line {first_line[word]})", line_number)
        first_line[word] = line_number
    vocabulary = Vocabulary(SPECIAL_TOKENS + tuple(word for word in unigrams.words if word not in SPECIAL_TOKENS))
    ids: defaultdict[str, int] = defaultdict(lambda: -1)  # -1 marks words without a unigram
    ids.update((token, index) for index, token in enumerate(vocabulary.tokens))

    ngrams, probs, backoffs = [], [], []
    for section in sections:
        k = section.order
        words = section.words
        rows = np.fromiter(map(ids.__getitem__, words), dtype=np.int64, count=len(words)).reshape(-1, k)
        line_numbers = np.array(section.line_numbers, dtype=np.int64)
        if len(rows) and rows.min() < 0:
            first = int(np.flatnonzero((rows < 0).any(axis=1))[0])
            word = section.words[first * k + int(np.flatnonzero(rows[first] < 0)[0])]
            raise InputFileError(path, f"word {word!r} has no \\1-grams: entry", int(line_numbers[first]))
        values = _log10_values(path, section.probs, section.line_numbers, "probability")
        if k < order:
            weights = _log10_values(path, section.backoffs, section.line_numbers, "back-off")
        else:
            weights = np.zeros(len(values))
        if k == 1:
            rows, values, weights, line_numbers = _add_missing_specials(rows, values, weights, line_numbers)
        permutation = sort_rows(rows)
        rows, values, weights = rows[permutation].astype(np.int32), values[permutation], weights[permutation]
        line_numbers = line_numbers[permutation]
        if len(rows) > 1:
            duplicates = np.flatnonzero(np.all(rows[1:] == rows[:-1], axis=1))
            if len(duplicates):
                lines = sorted(line_numbers[duplicates[0] : duplicates[0] + 2].tolist())
                raise InputFileError(path, f"{k}-gram listed twice (first on line {lines[0]})", lines[1])
        ngrams.append(rows)
        probs.append(values)
        backoffs.append(weights)
    try:
        model = complete_ngram_model(NgramModel(len(vocabulary), tuple(ngrams), tuple(probs), tuple(backoffs)))
    except ValueError as error:
        raise InputFileError(path, str(error), last_line) from None
    return model, vocabulary


def _add_missing_specials(
    rows: npt.NDArray[np.int64],
    values: npt.NDArray[np.float64],
    weights: npt.NDArray[np.float64],
    line_numbers: npt.NDArray[np.int64],
) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.float64], npt.NDArray[np.float64], npt.NDArray[np.int64]]:
    """Unigram arrays with ``<unk>``, ``<s>`` and ``</s>`` present (added as never predicted when missing)."""
    present = set(rows[:, 0].tolist())
    missing = [word for word in (UNKNOWN_ID, SENTENCE_START_ID, SENTENCE_END_ID) if word not in present]
    if not missing:
        return rows, values, weights, line_numbers
    return (
        np.concatenate([rows, np.array(missing, dtype=np.int64)[:, None]]),
        np.concatenate([values, np.full(len(missing), NEVER_LOG10)]),
        np.concatenate([weights, np.zeros(len(missing))]),
        np.concatenate([line_numbers, np.zeros(len(missing), dtype=np.int64)]),
    )
