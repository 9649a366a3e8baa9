"""The glossary model: status and boolean spellings, ordering of alternatives, the forbidden list, limits."""

import pytest

from decoder.terminology.glossary import (
    MAX_ENTRIES,
    Glossary,
    GlossaryEntry,
    TargetTerm,
    TermStatus,
    forbidden_target_texts,
    parse_boolean,
    parse_status,
)

PREFERRED, ADMITTED, DEPRECATED, SUPERSEDED = (
    TermStatus.PREFERRED,
    TermStatus.ADMITTED,
    TermStatus.DEPRECATED,
    TermStatus.SUPERSEDED,
)


# The four picklist values of administrativeStatus in the TBX-Basic DCA schematron (TBX-Basic dialect 1.2),
# our short names, and the empty cell (preferred by our convention, see tsv.py).
@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("preferredTerm-admn-sts", PREFERRED),
        ("admittedTerm-admn-sts", ADMITTED),
        ("deprecatedTerm-admn-sts", DEPRECATED),
        ("supersededTerm-admn-sts", SUPERSEDED),
        ("Deprecated", DEPRECATED),
        (" admitted ", ADMITTED),
        ("", PREFERRED),
        ("forbidden", None),
        ("obsolete", None),
    ],
)
def test_parse_status_accepts_tbx_picklist_and_short_names(text, expected):
    assert parse_status(text) is expected


# The accepted spellings are the ones the task specifies for the case_sensitive column: yes/no/true/false/1/0.
@pytest.mark.parametrize(
    ("text", "expected"),
    [("yes", True), ("TRUE", True), ("1", True), ("no", False), ("False", False), ("0", False), ("", False)],
)
def test_parse_boolean_spellings(text, expected):
    assert parse_boolean(text) is expected


@pytest.mark.parametrize("text", ["y", "2", "si", "on"])
def test_parse_boolean_refuses_other_words(text):
    assert parse_boolean(text) is None


def test_allowed_targets_put_preferred_before_admitted_and_keep_file_order():
    # Hand-built entry: an admitted term listed first must still come after both preferred ones.
    entry = GlossaryEntry(
        "workspace",
        (
            TargetTerm("área de trabajo", ADMITTED),
            TargetTerm("espacio de trabajo", PREFERRED),
            TargetTerm("zona de trabajo", DEPRECATED),
            TargetTerm("entorno de trabajo", PREFERRED),
        ),
    )
    assert [target.text for target in entry.allowed_targets] == [
        "espacio de trabajo",
        "entorno de trabajo",
        "área de trabajo",
    ]
    assert [target.text for target in entry.forbidden_targets] == ["zona de trabajo"]


def test_forbidden_list_leaves_out_targets_another_entry_allows():
    # "respaldo" is deprecated for "backup" but preferred for "fallback" (an invented second concept), so it
    # must stay available; "basura" is forbidden everywhere.
    entries = (
        GlossaryEntry("backup", (TargetTerm("copia de seguridad", PREFERRED), TargetTerm("respaldo", DEPRECATED))),
        GlossaryEntry("fallback", (TargetTerm("respaldo", PREFERRED),)),
        GlossaryEntry("trash", (TargetTerm("papelera", PREFERRED), TargetTerm("basura", SUPERSEDED))),
    )
    assert forbidden_target_texts(entries) == ("basura",)
    assert Glossary("g", "en", "es", entries).forbidden_targets == ("basura",)


def test_glossary_refuses_more_than_the_entry_limit():
    entry = GlossaryEntry("tag", (TargetTerm("etiqueta", PREFERRED),))
    Glossary("g", "en", "es", (entry,) * MAX_ENTRIES)  # exactly at the limit is fine
    with pytest.raises(ValueError, match="limit is 100000"):
        Glossary("g", "en", "es", (entry,) * (MAX_ENTRIES + 1))
