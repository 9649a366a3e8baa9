"""Morphology for the demo corpus generator: lexicon records, noun phrases, agreement and number formats.

English noun phrases put adjectives before the noun; Spanish ones put them after it and inflect article and
adjective for the noun's gender and number (RAE, Nueva gramática de la lengua española, 2009; from memory).
Compound nouns such as "project folder" are lexicon entries of their own ("carpeta de proyecto", feminine), so
an adjective agrees with the Spanish head: "the shared project folder" -> "la carpeta de proyecto compartida".
Number formats follow the RAE's Ortografía de la lengua española (2010, from memory): decimal comma, no
separator in four-digit integers, a space before the percent sign; times use the 24-hour clock.
Standard library only.
"""

from __future__ import annotations

import re
from dataclasses import dataclass

MASCULINE = "m"
FEMININE = "f"


@dataclass(frozen=True, slots=True)
class Noun:
    """A countable noun (or fixed multi-word term) with its English and Spanish forms.

    ``english_article`` is False for features English names without "the" ("turn on focus mode") while
    Spanish still needs the article ("active el modo de concentración")."""

    key: str
    en: str
    en_plural: str
    es: str
    es_plural: str
    gender: str
    category: str
    english_article: bool = True


@dataclass(frozen=True, slots=True)
class Adjective:
    """``es_forms`` are masculine singular, feminine singular, masculine plural, feminine plural."""

    key: str
    en: str
    es_forms: tuple[str, str, str, str]
    categories: tuple[str, ...]
    only: tuple[str, ...] = ()  # noun keys allowed in addition to the categories

    def es(self, gender: str, plural: bool) -> str:
        return self.es_forms[(2 if plural else 0) + (1 if gender == FEMININE else 0)]

    def fits(self, noun: Noun) -> bool:
        return noun.category in self.categories or noun.key in self.only


@dataclass(frozen=True, slots=True)
class Verb:
    """An action on a noun. Spanish forms address the reader as *usted* (imperative and present).

    ``es_participle`` is the invariant form of compound tenses ("se ha ocultado"); ``es_adjectival`` the
    masculine singular of the agreeing form used in status messages ("Columna oculta."). Either may be None
    where the construction does not exist for this verb (Spanish "cambiar el nombre de" has no participle
    that agrees with the renamed object)."""

    key: str
    en: str
    en_participle: str
    en_gerund: str
    es_infinitive: str
    es_imperative: str
    es_present: str
    es_gerund: str
    es_participle: str | None
    es_adjectival: str | None
    button_en: str
    button_es: str
    categories: tuple[str, ...]
    only: tuple[str, ...] = ()
    exclude: tuple[str, ...] = ()

    def fits(self, noun: Noun) -> bool:
        if noun.key in self.exclude:
            return False
        return noun.category in self.categories or noun.key in self.only


def inflect(masculine_singular: str) -> tuple[str, str, str, str]:
    """The four agreeing forms of a Spanish adjective or participle from its masculine singular.

    Rules as in any Spanish reference grammar (RAE 2009, from memory): -o alternates with -a; other
    adjectives have one form for both genders; plural adds -s after a vowel and -es after a consonant.
    Only the last word of a multi-word form ("no leído") inflects. Enough for this lexicon, not in general
    (no -z -> -ces, no accent shifts as in "común" -> "comunes")."""
    head, _, last = masculine_singular.rpartition(" ")
    prefix = head + " " if head else ""
    if last.endswith("o"):
        forms = (last, last[:-1] + "a", last + "s", last[:-1] + "as")
    elif last[-1] in "aeiouáéí":
        forms = (last, last, last + "s", last + "s")
    else:
        forms = (last, last, last + "es", last + "es")
    return tuple(prefix + form for form in forms)  # type: ignore[return-value]


DEFINITE = {(MASCULINE, False): "el", (FEMININE, False): "la", (MASCULINE, True): "los", (FEMININE, True): "las"}
INDEFINITE = {(MASCULINE, False): "un", (FEMININE, False): "una", (MASCULINE, True): "unos", (FEMININE, True): "unas"}
DEMONSTRATIVE = {
    (MASCULINE, False): "este",
    (FEMININE, False): "esta",
    (MASCULINE, True): "estos",
    (FEMININE, True): "estas",
}
ALL = {MASCULINE: "todos los", FEMININE: "todas las"}
OBJECT_PRONOUN = {(MASCULINE, False): "lo", (FEMININE, False): "la", (MASCULINE, True): "los", (FEMININE, True): "las"}
STRESSED_PRONOUN = {MASCULINE: "él", FEMININE: "ella"}


def a_or_an(word: str) -> str:
    """English indefinite article by the sound of ``word``; "user" and "unique" start with a consonant sound."""
    lowered = word.lower()
    if lowered.startswith(("us", "uni", "use", "eu", "one")):
        return "a"
    return "an" if lowered[:1] in "aeiou" else "a"


def english_noun_phrase(
    noun: Noun, determiner: str = "the", plural: bool = False, adjective: Adjective | None = None
) -> str:
    """``determiner`` is one of the, a, this, your, all, each, bare; "the" is dropped for article-less terms."""
    words = noun.en_plural if plural else noun.en
    if adjective is not None:
        words = f"{adjective.en} {words}"
    if determiner == "the" and not noun.english_article:
        return words
    if determiner == "a":
        return words if plural else f"{a_or_an(words)} {words}"
    if determiner == "this":
        return f"{'these' if plural else 'this'} {words}"
    if determiner == "bare":
        return words
    return f"{determiner} {words}"


def spanish_noun_phrase(
    noun: Noun, determiner: str = "the", plural: bool = False, adjective: Adjective | None = None
) -> str:
    """The Spanish counterpart of ``english_noun_phrase``: article and adjective agree with the noun."""
    words = noun.es_plural if plural else noun.es
    if adjective is not None:
        words = f"{words} {adjective.es(noun.gender, plural)}"
    key = (noun.gender, plural)
    if determiner == "the":
        return f"{DEFINITE[key]} {words}"
    if determiner == "a":
        return words if plural else f"{INDEFINITE[key]} {words}"
    if determiner == "this":
        return f"{DEMONSTRATIVE[key]} {words}"
    if determiner == "your":
        return f"{'sus' if plural else 'su'} {words}"
    if determiner == "all":
        return f"{ALL[noun.gender]} {words}"
    if determiner == "each":
        return f"cada {words}"
    return words


def agree(masculine_singular: str, noun: Noun, plural: bool) -> str:
    forms = inflect(masculine_singular)
    return forms[(2 if plural else 0) + (1 if noun.gender == FEMININE else 0)]


_CONTRACTIONS = (
    (re.compile(r"\b([Aa]) el\b"), r"\1l"),  # a + el -> al, obligatory in writing (RAE 2010)
    (re.compile(r"\b([Dd])e el\b"), r"\1el"),  # de + el -> del
)


def contract(spanish: str) -> str:
    for pattern, replacement in _CONTRACTIONS:
        spanish = pattern.sub(replacement, spanish)
    return spanish


def capitalize_first(text: str) -> str:
    """Upper-case the first letter, skipping opening ¿ ¡ and markup; placeholders at the start stay as they are."""
    match = re.match(r"^((?:[¿¡]|<[^>]+>)*)([a-záéíóúñ])", text)
    if match is None:
        return text
    return text[: match.start(2)] + match.group(2).upper() + text[match.end(2) :]


def count_phrase_en(count: int, noun: Noun, adjective: Adjective | None = None) -> str:
    """ "1 file", "3 shared files": the noun is singular only for exactly one."""
    return f"{english_integer(count)} {english_noun_phrase(noun, 'bare', count != 1, adjective)}"


def count_phrase_es(count: int, noun: Noun, adjective: Adjective | None = None) -> str:
    return f"{spanish_integer(count)} {spanish_noun_phrase(noun, 'bare', count != 1, adjective)}"


def english_integer(value: int) -> str:
    return f"{value:,}"


def spanish_integer(value: int) -> str:
    """RAE (2010): no separator up to four digits, a (thin) space from five digits on."""
    return str(value) if value < 10_000 else f"{value:,}".replace(",", " ")


def english_decimal(value: float, places: int = 1) -> str:
    return f"{value:.{places}f}"


def spanish_decimal(value: float, places: int = 1) -> str:
    """Decimal comma, as used in Spain (RAE 2010 admits the point as well; our style guide picks the comma)."""
    return f"{value:.{places}f}".replace(".", ",")


def english_percent(text_number: str) -> str:
    return f"{text_number}%"


def spanish_percent(text_number: str) -> str:
    """RAE (2010): the percent sign is separated from the number by a space."""
    return f"{text_number} %"


def english_time(hour_24: int, minute: int) -> str:
    hour_12 = hour_24 % 12 or 12
    return f"{hour_12}:{minute:02d} {'AM' if hour_24 < 12 else 'PM'}"


def spanish_time(hour_24: int, minute: int) -> str:
    return f"{hour_24}:{minute:02d}"


def spanish_at_time(hour_24: int, minute: int) -> str:
    """ "a la 1:30" but "a las 15:30": the article agrees with the hour (una hora, las tres)."""
    article = "la" if hour_24 == 1 else "las"
    return f"a {article} {spanish_time(hour_24, minute)}"
