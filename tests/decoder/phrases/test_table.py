"""The phrase table: lookup, spans, array round trip, readable export, building and its statistics."""

from collections import defaultdict

import numpy as np
import pytest
from nltk.translate.phrase_based import phrase_extraction

from decoder.errors import ModelLoadError
from decoder.phrases import PhraseSettings, PhraseTable, build_phrase_table
from decoder.phrases.extraction import extract_instances

from .helpers import corpus_from_tokens, random_aligned_corpus
from .lamp_corpus import SEGMENTS


@pytest.fixture(scope="module")
def random_table():
    rng = np.random.default_rng(8)
    corpus, alignments, _ = random_aligned_corpus(rng, 150, vocabulary_size=5)
    table = build_phrase_table(corpus, alignments, PhraseSettings(max_targets_per_source=None))
    # Expected contents, from the extracted occurrences (not from the table): source tuple -> target tuples.
    instances = extract_instances(corpus, alignments, 7)
    expected = defaultdict(set)
    for k in range(len(instances)):
        segment = int(instances.segment[k])
        source = tuple(corpus.source[segment][instances.source_start[k] : instances.source_end[k]].tolist())
        target = tuple(corpus.target[segment][instances.target_start[k] : instances.target_end[k]].tolist())
        expected[source].add(target)
    return corpus, table, dict(expected)


def targets_of(table, rows):
    return {tuple(table.target_phrase(row).tolist()) for row in rows}


def test_lookup_finds_every_stored_phrase_with_its_targets(random_table):
    _, table, expected = random_table
    assert table.num_source_phrases == len(expected)
    for source, targets in expected.items():
        assert targets_of(table, table.lookup(source)) == targets, source


def test_lookup_finds_nothing_else(random_table):
    # Every span of every segment and many random id sequences: found exactly when extracted.
    corpus, table, expected = random_table
    queries = {
        tuple(segment[start:end].tolist())
        for segment in corpus.source
        for start in range(len(segment))
        for end in range(start + 1, len(segment) + 1)
    }
    rng = np.random.default_rng(2)
    queries |= {tuple(rng.integers(3, 10, rng.integers(1, 9)).tolist()) for _ in range(2000)}
    for query in queries:
        assert (len(table.lookup(query)) > 0) == (query in expected), query
    assert len(table.lookup([])) == 0
    # The padding id must not match the padded tail of a shorter phrase.
    stored = min(expected, key=len)
    assert len(table.lookup([*stored, -1])) == 0


def test_spans_match_brute_force(random_table):
    corpus, table, expected = random_table
    for segment in corpus.source:
        tokens = segment.tolist()
        brute_force = [
            (start, end)
            for start in range(len(tokens))
            for end in range(start + 1, len(tokens) + 1)
            if tuple(tokens[start:end]) in expected
        ]
        found = list(table.spans(tokens))
        assert [(start, end) for start, end, _ in found] == brute_force
        for start, end, rows in found:
            assert rows == table.lookup(tokens[start:end])


def test_spans_respect_max_length(random_table):
    corpus, table, _ = random_table
    tokens = max(corpus.source, key=len).tolist()
    assert all(end - start <= 2 for start, end, _ in table.spans(tokens, max_length=2))


def test_round_trip_through_memory_mapped_npy_files(random_table, tmp_path):
    corpus, table, _ = random_table
    for name, array in table.to_arrays().items():
        np.save(tmp_path / f"{name}.npy", array)
    loaded = PhraseTable.from_arrays(
        {path.stem: np.load(path, mmap_mode="r") for path in tmp_path.glob("*.npy")}
    )
    assert isinstance(loaded.scores, np.memmap)  # really served from the files
    assert loaded.stats == table.stats
    for name, array in table.to_arrays().items():
        np.testing.assert_array_equal(loaded.to_arrays()[name], array, err_msg=name)
    tokens = corpus.source[0].tolist()
    assert list(loaded.spans(tokens)) == list(table.spans(tokens))


def test_from_arrays_names_the_missing_or_misshapen_array(random_table):
    _, table, _ = random_table
    arrays = table.to_arrays()
    with pytest.raises(ModelLoadError, match="'reordering' is missing"):
        PhraseTable.from_arrays({name: array for name, array in arrays.items() if name != "reordering"})
    with pytest.raises(ModelLoadError, match="'scores' has shape"):
        PhraseTable.from_arrays({**arrays, "scores": arrays["scores"][:, :3]})


@pytest.fixture(scope="module")
def lamp():
    corpus, alignments, source_vocabulary, target_vocabulary = corpus_from_tokens(SEGMENTS)
    return corpus, alignments, source_vocabulary, target_vocabulary


def nltk_pairs():
    """Phrase pairs of the lamp corpus per nltk (every segment is shorter than 7 words, so no filtering)."""
    occurrences = []
    for source, target, links in SEGMENTS:
        occurrences += [
            (source_words, target_words)
            for _, _, source_words, target_words in phrase_extraction(source, target, links, 7)
        ]
    return occurrences


def test_build_reports_sizes_before_and_after_pruning(lamp):
    # Reference for the sizes: nltk.translate.phrase_based.phrase_extraction on each segment.
    corpus, alignments, _, _ = lamp
    occurrences = nltk_pairs()
    table = build_phrase_table(corpus, alignments, PhraseSettings(max_targets_per_source=1))
    assert table.stats.num_segments == 5
    assert table.stats.num_occurrences == len(occurrences)
    assert table.stats.num_pairs_before_pruning == len(set(occurrences))
    assert table.stats.num_pairs_after_pruning == len({source for source, _ in occurrences})
    assert table.stats.num_source_phrases == len({source for source, _ in occurrences})
    assert len(table) == table.stats.num_pairs_after_pruning


def test_pruning_keeps_scores_and_reordering_of_surviving_pairs(lamp):
    corpus, alignments, source_vocabulary, target_vocabulary = lamp
    full = build_phrase_table(corpus, alignments, PhraseSettings(max_targets_per_source=None))
    pruned = build_phrase_table(corpus, alignments, PhraseSettings(max_targets_per_source=1))
    source = source_vocabulary.encode(["la"])
    # "la": "the" (3/4 * 3/4) beats "a" (1/4 * 1/4), see test_scoring.py.
    assert targets_of(full, full.lookup(source)) == {
        (target_vocabulary.id_of("the"),),
        (target_vocabulary.id_of("a"),),
    }
    (row,) = pruned.lookup(source)
    assert pruned.target_phrase(row).tolist() == [target_vocabulary.id_of("the")]
    full_row = next(
        r for r in full.lookup(source) if full.target_phrase(r).tolist() == [target_vocabulary.id_of("the")]
    )
    np.testing.assert_array_equal(pruned.scores[row], full.scores[full_row])
    np.testing.assert_array_equal(pruned.reordering[row], full.reordering[full_row])
    assert pruned.scores[row, 0] == pytest.approx(np.log(3 / 4), abs=1e-6)  # float32 storage


def test_export_tsv_is_readable(lamp, tmp_path):
    corpus, alignments, source_vocabulary, target_vocabulary = lamp
    table = build_phrase_table(corpus, alignments)
    path = tmp_path / "phrases.tsv"
    table.export_tsv(path, source_vocabulary, target_vocabulary)
    lines = path.read_text(encoding="utf-8").splitlines()
    assert lines[0].split("\t")[:6] == ["source", "target", "phrase_fwd", "phrase_bwd", "lex_fwd", "lex_bwd"]
    assert len(lines) == 1 + len(table)
    by_pair = {tuple(line.split("\t")[:2]): line.split("\t") for line in lines[1:]}
    # "la"/"the": phrase_fwd log(3/4) = -0.287682, seen 3 times, one link 0-0.
    row = by_pair[("la", "the")]
    assert (row[2], row[-2], row[-1]) == ("-0.287682", "0-0", "3")
    assert by_pair[("apaga", "switch off")][-2] == "0-0 0-1"


def test_corpus_without_links_gives_an_empty_table():
    corpus, alignments, _, _ = corpus_from_tokens([("a b", "A", []), ("c", "C D", [])])
    table = build_phrase_table(corpus, alignments)
    assert (len(table), table.num_source_phrases, table.stats.num_occurrences) == (0, 0, 0)
    assert list(table.spans(corpus.source[0])) == []
