"""ARPA back-off files: round trip, hand-written files scored by the back-off rule, completion of missing
prefixes and suffixes, and errors that name the file and line."""

from __future__ import annotations

import numpy as np
import pytest

from decoder.errors import InputFileError
from decoder.lm.arpa import read_arpa, write_arpa
from decoder.lm.kneser_ney import train_kneser_ney
from decoder.lm.query import LanguageModel
from decoder.vocabulary import SPECIAL_TOKENS, Vocabulary

from .lm_helpers import HAND_SEGMENTS, HAND_VOCABULARY, as_segment_array, random_segments

# A hand-written bigram file for the (fictional) Lumora desk lamp's voice commands.
LAMP_BIGRAMS = """\
Any text before the data line is a comment.

\\data\\
ngram 1=5
ngram 2=3

\\1-grams:
-1.0\t<unk>
-99\t<s>\t-0.5
-0.3\t</s>
-0.6\tlamp\t-0.2
-0.9 dim -0.1

\\2-grams:
-0.1\t<s> lamp
-0.4\tlamp </s>
-0.05 lamp dim

\\end\\
"""


def write_text(tmp_path, text, name="model.arpa"):
    path = tmp_path / name
    path.write_text(text, encoding="utf-8")
    return path


def test_vocabulary_from_unigram_section(tmp_path):
    _, vocabulary = read_arpa(write_text(tmp_path, LAMP_BIGRAMS))
    # Specials keep their reserved ids, other words follow in file order.
    assert vocabulary.tokens == SPECIAL_TOKENS + ("lamp", "dim")


@pytest.mark.parametrize(
    ("history", "word", "expected"),
    [
        # Listed n-grams: their own log10 probability.
        (["<s>"], "lamp", -0.1),
        (["lamp"], "</s>", -0.4),
        ([], "dim", -0.9),
        # Back-off rule by hand: log10 p(w | h) = backoff(h) + log10 p(w).
        (["lamp"], "lamp", -0.2 + -0.6),
        (["<s>"], "</s>", -0.5 + -0.3),
        (["dim"], "lamp", -0.1 + -0.6),
        (["</s>"], "dim", 0.0 + -0.9),  # </s> lists no back-off weight: log10 1 = 0
        (["<s>"], "never-seen", -0.5 + -1.0),  # unknown words are scored as <unk>
    ],
)
def test_hand_written_file_follows_the_back_off_rule(tmp_path, history, word, expected):
    model, vocabulary = read_arpa(write_text(tmp_path, LAMP_BIGRAMS))
    language_model = LanguageModel.from_ngram_model(model, probability_dtype=np.float64)
    state = language_model.null_state()
    for token in history:
        state = language_model.score(state, vocabulary.id_of(token))[1]
    assert language_model.score(state, vocabulary.id_of(word))[0] == pytest.approx(expected, abs=1e-12)


LAMP_TRIGRAMS_WITH_GAPS = """\
\\data\\
ngram 1=5
ngram 2=1
ngram 3=2

\\1-grams:
-1.0 <unk>
-99 <s> -0.5
-0.3 </s>
-0.6 lamp -0.2
-0.7 on -0.3

\\2-grams:
-0.1 <s> lamp -0.4

\\3-grams:
-0.05 <s> lamp on
-0.02 <s> on lamp
\\end\\
"""


@pytest.mark.parametrize(
    ("history", "word", "expected"),
    [
        (["<s>", "lamp"], "on", -0.05),
        (["<s>", "on"], "lamp", -0.02),
        # "lamp on" (suffix of a listed trigram) is missing: backoff(lamp) + p(on) = -0.2 - 0.7.
        (["lamp"], "on", -0.9),
        # "<s> on" (prefix of a listed trigram) is missing: backoff(<s>) + p(on) = -0.5 - 0.7.
        (["<s>"], "on", -1.2),
        # "on lamp" (suffix of "<s> on lamp") is missing: backoff(on) + p(lamp) = -0.3 - 0.6.
        (["on"], "lamp", -0.9),
        # backoff(<s> lamp) + backoff(lamp) + p(</s>) = -0.4 - 0.2 - 0.3.
        (["<s>", "lamp"], "</s>", -0.9),
        # The added "lamp on" has back-off weight 1: p(</s> | lamp on) = backoff(on) + p(</s>) = -0.3 - 0.3.
        (["lamp", "on"], "</s>", -0.6),
        # The added "<s> on" likewise: p(on | <s> on) = backoff(on) + p(on) = -0.3 - 0.7.
        (["<s>", "on"], "on", -1.0),
    ],
)
def test_missing_prefixes_and_suffixes_are_added_without_changing_probabilities(tmp_path, history, word, expected):
    model, vocabulary = read_arpa(write_text(tmp_path, LAMP_TRIGRAMS_WITH_GAPS))
    assert model.num_ngrams(2) == 4  # "<s> lamp" plus the added "lamp on", "<s> on" and "on lamp"
    language_model = LanguageModel.from_ngram_model(model, probability_dtype=np.float64)
    state = language_model.null_state()
    for token in history:
        state = language_model.score(state, vocabulary.id_of(token))[1]
    assert language_model.score(state, vocabulary.id_of(word))[0] == pytest.approx(expected, abs=1e-12)
    ids = [vocabulary.id_of(token) for token in history]
    direct = model.log10_probabilities(np.array([ids], dtype=np.int64), [vocabulary.id_of(word)])[0]
    assert direct == pytest.approx(expected, abs=1e-12)


def test_missing_special_unigrams_are_added_as_never_predicted(tmp_path):
    text = "\\data\\\nngram 1=2\n\n\\1-grams:\n-0.3 lamp\n-0.2 on\n\n\\end\\\n"
    model, vocabulary = read_arpa(write_text(tmp_path, text))
    probs = dict(zip(model.ngrams[0][:, 0].tolist(), model.log10_probs[0].tolist(), strict=True))
    assert probs == {0: -99.0, 1: -99.0, 2: -99.0, vocabulary.id_of("lamp"): -0.3, vocabulary.id_of("on"): -0.2}


@pytest.mark.parametrize("order", [1, 3, 5])
def test_round_trip_keeps_ngrams_and_probabilities(tmp_path, order):
    vocabulary_size = 16
    tokens = SPECIAL_TOKENS + tuple(f"tok{index}" for index in range(4, vocabulary_size))
    vocabulary = Vocabulary(tokens)
    model = train_kneser_ney(as_segment_array(random_segments(order, 40, vocabulary_size, 9)), vocabulary_size, order)
    path = tmp_path / "round.arpa"
    write_arpa(model, vocabulary, path)
    loaded, loaded_vocabulary = read_arpa(path)
    assert loaded_vocabulary.tokens == vocabulary.tokens
    for k in range(order):
        np.testing.assert_array_equal(loaded.ngrams[k], model.ngrams[k])
        # %.7g keeps 7 significant digits: relative error at most 5e-7.
        np.testing.assert_allclose(loaded.log10_probs[k], model.log10_probs[k], rtol=5e-7, atol=0)
        np.testing.assert_allclose(loaded.log10_backoffs[k], model.log10_backoffs[k], rtol=5e-7, atol=0)


def test_written_file_layout(tmp_path):
    model = train_kneser_ney(as_segment_array(HAND_SEGMENTS), 8, order=2)
    path = tmp_path / "hand.arpa"
    write_arpa(model, HAND_VOCABULARY, path)
    lines = path.read_text(encoding="utf-8").splitlines()
    # Counts by hand (test_counts.py): 7 unigrams (all ids but <null>) and 8 distinct bigrams.
    assert lines[:3] == ["\\data\\", "ngram 1=7", "ngram 2=8"]
    assert lines[-1] == "\\end\\"
    # p(start | press) = 69/128 (test_kneser_ney.py), log10 = -0.2683591..; bigrams carry no back-off field.
    assert f"{np.log10(69 / 128):.7g}\tpress start" in lines
    # <s> is never predicted (-99) and has back-off weight gamma(<s>) = 1/4.
    assert f"-99\t<s>\t{np.log10(1 / 4):.7g}" in lines


def replace_line(text, old, new):
    assert old in text
    return text.replace(old, new, 1)


@pytest.mark.parametrize(
    ("text", "line", "message"),
    [
        (replace_line(LAMP_BIGRAMS, "-0.6\tlamp\t-0.2", "-0.6x\tlamp\t-0.2"), 11, "not a number"),
        (replace_line(LAMP_BIGRAMS, "-0.9 dim -0.1", "0.5 dim -0.1"), 12, "at most 0"),
        (replace_line(LAMP_BIGRAMS, "-0.4\tlamp </s>", "-0.4\tlamp </s> -0.1 extra"), 16, "fields"),
        (replace_line(LAMP_BIGRAMS, "-0.05 lamp dim", "-0.05 lamp lamp-x"), 17, "has no \\1-grams: entry"),
        (replace_line(LAMP_BIGRAMS, "-0.9 dim -0.1", "-0.9 lamp -0.1"), 12, "listed twice"),
        (replace_line(LAMP_BIGRAMS, "-0.05 lamp dim", "-0.05 lamp </s>"), 17, "listed twice"),
        (replace_line(LAMP_BIGRAMS, "ngram 2=3", "ngram 2=4"), 19, "declares 4"),
        (replace_line(LAMP_BIGRAMS, "ngram 1=5", "ngram 1=6"), 14, "declares 6"),
        (replace_line(LAMP_BIGRAMS, "ngram 2=3", "ngram two=3"), 5, "ngram k=COUNT"),
        (replace_line(LAMP_BIGRAMS, "\\2-grams:", "\\3-grams:"), 14, "unexpected section"),
        (replace_line(LAMP_BIGRAMS, "\\end\\", ""), 19, "ends before \\end\\"),
        (replace_line(LAMP_BIGRAMS, "\\data\\", "data"), 19, "no \\data\\"),
    ],
)
def test_malformed_files_name_the_file_and_line(tmp_path, text, line, message):
    path = write_text(tmp_path, text, "broken.arpa")
    with pytest.raises(InputFileError) as caught:
        read_arpa(path)
    assert caught.value.path == str(path)
    assert caught.value.location == line
    assert message in caught.value.detail
