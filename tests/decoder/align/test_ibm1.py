"""IBM Model 1 against a hand derivation, a published worked example and nltk's implementation."""

from __future__ import annotations

import random
from fractions import Fraction

import numpy as np
import pytest
from nltk.translate import AlignedSent, IBMModel1

from decoder.align.ibm1 import Ibm1Trainer, model1_expected_counts, model1_expected_counts_reference
from decoder.align.workspace import CellWorkspace
from decoder.executor import LocalProcessExecutor

from .corpus_helpers import encode_pairs

TEXTBOOK_CORPUS = [("das Haus", "the house"), ("das Buch", "the book"), ("ein Buch", "a book")]


def probability(table, source_vocabulary, target_vocabulary, source, target):
    return table.probability(source_vocabulary.id_of(source), target_vocabulary.id_of(target))


# Hand derivation, no NULL word, uniform start (any constant start gives the same first E-step):
# iteration 1: every word of a pair shares each target word equally, e.g. c(the, das) = 1/2 + 1/2 = 1,
#   c(house, das) = c(book, das) = 1/2, so t(the|das) = 1/2, t(house|das) = 1/4.
# iteration 2: in "das Haus / the house", 'house' splits 1/4 : 1/2 between das and Haus (1/3 vs 2/3);
#   in "das Buch / the book", 'the' splits 1/2 : 1/4 (2/3 to das). c(the, das) = 1/2 + 2/3 = 7/6,
#   c(house, das) = c(book, das) = 1/3, total(das) = 11/6, so t(the|das) = 7/11, t(house|das) = 2/11;
#   c(house, Haus) = 2/3, c(the, Haus) = 1/2, so t(house|Haus) = 4/7.
@pytest.mark.parametrize(("num_iterations", "source", "target", "expected"), [
    (1, "das", "the", Fraction(1, 2)), (1, "das", "house", Fraction(1, 4)), (1, "Haus", "house", Fraction(1, 2)),
    (2, "das", "the", Fraction(7, 11)), (2, "Haus", "house", Fraction(4, 7)), (2, "das", "house", Fraction(2, 11)),
])
def test_model1_matches_hand_derivation(num_iterations, source, target, expected):
    corpus, source_vocabulary, target_vocabulary = encode_pairs(TEXTBOOK_CORPUS)
    table = Ibm1Trainer(num_iterations, include_null=False).fit(corpus, len(source_vocabulary), len(target_vocabulary))
    assert probability(table, source_vocabulary, target_vocabulary, source, target) == pytest.approx(
        float(expected), abs=1e-12)


# Koehn, "Statistical Machine Translation" (Cambridge University Press, 2010), section 4.2.4: the table of
# t(e|f) over EM iterations for this corpus (values recalled from memory, printed there to 4 decimals).
@pytest.mark.parametrize(("num_iterations", "source", "target", "expected"), [
    (3, "das", "the", 0.7479), (3, "das", "house", 0.1313), (3, "Haus", "house", 0.6534),
    (3, "Buch", "book", 0.7479), (3, "ein", "a", 0.6534), (3, "Haus", "the", 0.3466),
])
def test_model1_matches_textbook_table(num_iterations, source, target, expected):
    corpus, source_vocabulary, target_vocabulary = encode_pairs(TEXTBOOK_CORPUS)
    table = Ibm1Trainer(num_iterations, include_null=False).fit(corpus, len(source_vocabulary), len(target_vocabulary))
    assert probability(table, source_vocabulary, target_vocabulary, source, target) == pytest.approx(
        expected, abs=5e-5)


def random_corpus(seed: int, num_pairs: int = 40, vocabulary_size: int = 12) -> list[tuple[str, str]]:
    """Random pairs; source words may repeat within a sentence, target words never do (see the nltk test)."""
    generator = random.Random(seed)
    words = [f"w{k}" for k in range(vocabulary_size)]
    def source():
        return " ".join(generator.choice(words) for _ in range(generator.randint(1, 6)))
    def target():
        return " ".join(generator.sample(words, generator.randint(1, 6))).upper()
    return [(source(), target()) for _ in range(num_pairs)]


# Reference library: nltk.translate.IBMModel1 (nltk >= 3.8). Same model: NULL word on the source side,
# uniform start, relative-frequency M-step. nltk floors probabilities at 1e-12 (IBMModel.MIN_PROB); with these
# small corpora no co-occurring pair comes near that floor, so the tables must agree to rounding.
# One difference: nltk normalises by a total per target word *type* (IBMModel1.prob_all_alignments returns a
# dict keyed by word), so a word that occurs twice in one target sentence gets half the expected count per
# occurrence. Brown et al. (1993), eq. (17), count per target *position*, as we do; the random corpora therefore
# never repeat a word within a target sentence, where both definitions coincide.
@pytest.mark.parametrize("seed", range(5))
@pytest.mark.parametrize("num_iterations", [1, 3])
def test_model1_matches_nltk(seed, num_iterations):
    pairs = random_corpus(seed)
    corpus, source_vocabulary, target_vocabulary = encode_pairs(pairs)
    table = Ibm1Trainer(num_iterations).fit(corpus, len(source_vocabulary), len(target_vocabulary))
    bitext = [AlignedSent(target.split(), source.split()) for source, target in pairs]
    reference = IBMModel1(bitext, num_iterations)
    compared = 0
    for source, target in pairs:
        for target_word in target.split():
            for source_word in [None] + source.split():
                ours = table.probability(source_vocabulary.id_of(source_word) if source_word else 3,
                                         target_vocabulary.id_of(target_word))
                assert ours == pytest.approx(reference.translation_table[target_word][source_word], abs=1e-9)
                compared += 1
    assert compared > 100


def test_model1_sharded_over_processes_equals_single_shard():
    pairs = random_corpus(11, num_pairs=300)
    corpus, source_vocabulary, target_vocabulary = encode_pairs(pairs)
    sizes = (len(source_vocabulary), len(target_vocabulary))
    with CellWorkspace(corpus, *sizes, num_shards=1) as single:
        expected, _ = Ibm1Trainer(4).fit_in(single)
    with LocalProcessExecutor(2) as executor, CellWorkspace(corpus, *sizes, executor=executor,
                                                            num_shards=7) as sharded:
        assert len(sharded.layouts) == 7
        actual, _ = Ibm1Trainer(4).fit_in(sharded)
    assert actual == pytest.approx(expected, abs=1e-12)


def test_model1_log_likelihood_never_decreases():
    # EM never lowers the likelihood (Dempster, Laird & Rubin 1977); Model 1's is also concave (Brown et al. 1993).
    corpus, *_ = encode_pairs(random_corpus(3, num_pairs=200))
    with CellWorkspace(corpus, 20, 20) as workspace:
        _, history = Ibm1Trainer(8).fit_in(workspace)
    values = [report.log_likelihood for report in history.iterations]
    assert all(later >= earlier - 1e-9 for earlier, later in zip(values, values[1:]))
    assert values[-1] > values[0]


def test_model1_viterbi_links_each_target_word_to_its_best_source_word():
    corpus, source_vocabulary, target_vocabulary = encode_pairs(TEXTBOOK_CORPUS * 3)
    with CellWorkspace(corpus, len(source_vocabulary), len(target_vocabulary), include_null=False) as workspace:
        probabilities, _ = Ibm1Trainer(10).fit_in(workspace)
        links = Ibm1Trainer.viterbi(workspace, probabilities)
    # After convergence das-the, Haus-house, Buch-book and ein-a dominate (Koehn 2010, section 4.2.4).
    assert links.link_set(0) == {(0, 0), (1, 1)}
    assert links.link_set(2) == {(0, 0), (1, 1)}


@pytest.mark.parametrize(("seed", "smallest_exponent"), [(0, -2), (1, -2), (2, -130), (3, -300)])
def test_model1_compiled_estep_equals_numpy_reference(seed, smallest_exponent):
    # the compiled E-step and the plain numpy path compute the same sums in a different order; tiny
    # probabilities check that the kernel's batched logarithm of row totals neither underflows nor drifts
    generator = random.Random(seed)
    words = [f"w{k}" for k in range(30)]
    pairs = [(" ".join(generator.choices(words, k=generator.randint(1, 9))),
              " ".join(generator.choices(words, k=generator.randint(1, 9)))) for _ in range(200)]
    corpus, source_vocabulary, target_vocabulary = encode_pairs(pairs)
    with CellWorkspace(corpus, len(source_vocabulary), len(target_vocabulary), num_shards=3) as workspace:
        exponents = np.random.default_rng(seed).uniform(smallest_exponent, 0.0, size=len(workspace.table_keys))
        probabilities = 10.0 ** exponents
        path = workspace.write_array("t", probabilities)
        compiled = [model1_expected_counts(job) for job in workspace.jobs(path)]
        reference = [model1_expected_counts_reference(job) for job in workspace.jobs(path)]
        for ours, theirs in zip(compiled, reference):
            assert ours.log_likelihood == pytest.approx(theirs.log_likelihood, rel=1e-12)
            assert ours.num_target_tokens == theirs.num_target_tokens
        np.testing.assert_allclose(workspace.merge_counts(compiled), workspace.merge_counts(reference), rtol=1e-12)
