"""Term accuracy on a hand-computed example.

Definition (Dinu et al. 2019, "Training Neural Machine Translation to Apply Terminology Constraints", ACL;
from memory): the share of glossary-term occurrences in the source whose target term appears in the output,
exact match. Counting is one-to-one (accuracy.py): one output occurrence satisfies one source occurrence.
"""

import pytest

from decoder.errors import ConfigurationError
from decoder.terminology.accuracy import TermAccuracy, term_accuracy
from decoder.terminology.store import load_glossary

SOURCES = [
    "Open the dashboard and the trash.",
    "Every backup replaces the previous backup.",
    "Brelqua stores the activity log.",
    "No glossary words here.",
    "Open the dashboard.",
]
OUTPUTS = [
    "Abra el panel de control y la papelera.",
    "Cada copia de seguridad reemplaza la anterior.",
    "brelqua guarda el historial de actividad.",
    "Aquí no hay términos.",
    "Abra el tablero de mandos.",
]


def test_term_accuracy_hand_computed():
    demo = load_glossary("demo", "en", "es")
    accuracy = term_accuracy(SOURCES, OUTPUTS, [demo], "en", "es")
    # By hand, per segment (terms from glossaries/demo.tsv):
    #   1. dashboard -> "panel de control" found, trash -> "papelera" found                 2 of 2
    #   2. backup twice, "copia de seguridad" once in the output (one-to-one)                1 of 2
    #   3. Brelqua is case-sensitive and the output has "brelqua"; activity log -> the
    #      admitted "historial de actividad" counts                                          1 of 2
    #   4. no terms                                                                          0 of 0
    #   5. dashboard -> only the deprecated "tablero de mandos"                              0 of 1
    # Total 4 correct of 7 term occurrences.
    assert accuracy == TermAccuracy(num_terms=7, num_correct=4, rate=pytest.approx(4 / 7))
    assert str(accuracy) == "term accuracy 57.1% (4/7)"


def test_no_terms_gives_no_rate():
    demo = load_glossary("demo", "en", "es")
    assert term_accuracy(["No glossary words here."], ["Nada."], [demo], "en", "es") == TermAccuracy(0, 0, None)


def test_inputs_must_line_up_and_languages_must_match():
    demo = load_glossary("demo", "en", "es")
    with pytest.raises(ValueError, match="2 source segments but 1 outputs"):
        term_accuracy(SOURCES[:2], OUTPUTS[:1], [demo], "en", "es")
    with pytest.raises(ConfigurationError, match="target language 'es'"):
        term_accuracy(SOURCES, OUTPUTS, [demo], "en", "fr")
