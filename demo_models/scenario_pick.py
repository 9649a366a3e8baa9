"""Random choices shared by the templates: nouns with fitting adjectives and verbs, numbers, times, placeholders.

Every helper takes the generator's ``random.Random`` so that one seed fixes the whole corpus. Numbers come
back as an (English, Spanish) pair of strings already formatted for each language.
"""

from __future__ import annotations

import random
from collections.abc import Callable, Sequence
from typing import TypeVar

import scenario_grammar as grammar
from scenario_grammar import Adjective, Noun, Verb
from scenario_lexicon import (
    ADJECTIVES,
    NOUN,
    NOUNS,
    TERMS,
    VERBS,
)
from scenario_ui_lexicon import (
    MONTHS,
    WEEKDAYS,
)

Choice = TypeVar("Choice")
Pair = tuple[str, str]

ALL_NOUNS = NOUNS + TERMS
SMALL_COUNTS = (1, 1, 2, 2, 3, 3, 4, 5, 6, 7, 8, 9, 10, 12, 15, 20)
LARGE_COUNTS = (25, 30, 40, 50, 75, 100, 150, 200, 250, 500, 1000, 1500, 2000, 2500, 5000)
MINUTES = (0, 0, 15, 30, 30, 45, 5, 10, 20, 50)


def choose(rng: random.Random, items: Sequence[Choice]) -> Choice:
    return items[rng.randrange(len(items))]


def nouns_where(predicate: Callable[[Noun], bool]) -> tuple[Noun, ...]:
    return tuple(noun for noun in ALL_NOUNS if predicate(noun))


def noun_of(rng: random.Random, keys: Sequence[str]) -> Noun:
    return NOUN[choose(rng, keys)]


def adjective_for(
    rng: random.Random, noun: Noun, probability: float = 1.0, exclude: Sequence[str] = ()
) -> Adjective | None:
    """A random adjective that fits ``noun`` (or None, with probability 1 - ``probability``)."""
    if rng.random() >= probability:
        return None
    fitting = [adjective for adjective in ADJECTIVES if adjective.fits(noun) and adjective.key not in exclude]
    return choose(rng, fitting) if fitting else None


_OBJECTS = {verb.key: tuple(noun for noun in ALL_NOUNS if verb.fits(noun)) for verb in VERBS}
# Adjectives that make sense on the object of verbs that bring something into being.
NEW_OBJECT_ADJECTIVES = ("large", "temporary", "private", "public", "empty")


def adjective_for_action(rng: random.Random, verb: Verb, noun: Noun, probability: float) -> Adjective | None:
    """An adjective for the object of ``verb``, avoiding nonsense such as "archive an archived file".

    Never the state the verb produces, never "selected" (the sentence selects the object itself), "deleted"
    only on things being restored, and only NEW_OBJECT_ADJECTIVES with create, upload and save."""
    excluded = {verb.en_participle, "selected", "duplicate" if verb.key == "duplicate" else ""}
    if verb.key != "restore":
        excluded.add("deleted")
    if verb.key in ("create", "upload", "save"):
        excluded.update(adjective.key for adjective in ADJECTIVES if adjective.key not in NEW_OBJECT_ADJECTIVES)
    return adjective_for(rng, noun, probability, exclude=tuple(sorted(excluded)))


def verb_and_noun(
    rng: random.Random,
    verb_filter: Callable[[Verb], bool] = lambda verb: True,
    noun_filter: Callable[[Noun], bool] = lambda noun: True,
) -> tuple[Verb, Noun]:
    """A verb and a noun it can take as object, both passing their filters."""
    verbs = [verb for verb in VERBS if verb_filter(verb)]
    while True:
        verb = choose(rng, verbs)
        fitting = [noun for noun in _OBJECTS[verb.key] if noun_filter(noun)]
        if fitting:
            return verb, choose(rng, fitting)


def count(rng: random.Random, large_probability: float = 0.25) -> int:
    return choose(rng, LARGE_COUNTS) if rng.random() < large_probability else choose(rng, SMALL_COUNTS)


def integer_pair(value: int) -> Pair:
    return grammar.english_integer(value), grammar.spanish_integer(value)


def size(rng: random.Random, gigabytes_only: bool = False) -> Pair:
    """A storage size such as ("2.5 GB", "2,5 GB") or ("500 MB", "500 MB")."""
    kind = rng.randrange(2 if gigabytes_only else 4)
    if kind == 0:
        value = choose(rng, (1.5, 2.5, 3.5, 4.5, 7.5))
        return f"{grammar.english_decimal(value)} GB", f"{grammar.spanish_decimal(value)} GB"
    if kind == 1:
        value = choose(rng, (1, 2, 4, 5, 10))
        return f"{value} GB", f"{value} GB"
    if rng.random() < 0.1:
        value = choose(rng, (250, 500, 750))
        return f"{value} KB", f"{value} KB"
    value = choose(rng, (5, 10, 25, 50, 100, 250, 500, 750))
    return f"{value} MB", f"{value} MB"


def storage_usage(rng: random.Random) -> tuple[str, str, str, str, str, str]:
    """A quota, the part of it in use and that part as a percentage, consistent with each other:
    (quota en, quota es, used en, used es, percent en, percent es), e.g. "20 GB", "15 GB", "75%"."""
    quota = choose(rng, (5, 10, 20, 50, 100, 200))
    share = choose(rng, (10, 20, 25, 40, 50, 60, 75, 80, 90, 95))
    used = f"{quota * share / 100:.2f}".rstrip("0").rstrip(".")
    return (
        f"{quota} GB",
        f"{quota} GB",
        f"{used} GB",
        f"{used.replace('.', ',')} GB",
        grammar.english_percent(str(share)),
        grammar.spanish_percent(str(share)),
    )


def percent(rng: random.Random) -> Pair:
    if rng.random() < 0.3:
        value = choose(rng, (12.5, 37.5, 62.5, 87.5, 99.5, 2.5, 0.5))
        return (
            grammar.english_percent(grammar.english_decimal(value)),
            grammar.spanish_percent(grammar.spanish_decimal(value)),
        )
    value = choose(rng, tuple(range(5, 101, 5)) + (1, 3, 8, 42, 64, 97, 99))
    return grammar.english_percent(str(value)), grammar.spanish_percent(str(value))


def clock(rng: random.Random) -> tuple[int, int]:
    """(hour on the 24-hour clock, minute); midnight is left out so that "12 AM" never needs explaining."""
    return rng.randrange(1, 24), choose(rng, MINUTES)


def at_time(rng: random.Random) -> Pair:
    """("at 3:15 PM", "a las 15:15")."""
    hour, minute = clock(rng)
    return f"at {grammar.english_time(hour, minute)}", grammar.spanish_at_time(hour, minute)


def until_time(rng: random.Random) -> Pair:
    """("until 3:15 PM", "hasta las 15:15")."""
    hour, minute = clock(rng)
    article = "la" if hour == 1 else "las"
    return f"until {grammar.english_time(hour, minute)}", f"hasta {article} {grammar.spanish_time(hour, minute)}"


def date(rng: random.Random) -> Pair:
    """("March 3", "3 de marzo"): Spanish puts the day first and writes the month in lower case."""
    month_en, month_es = choose(rng, MONTHS)
    day = rng.randrange(1, 29)
    return f"{month_en} {day}", f"{day} de {month_es}"


def weekday(rng: random.Random) -> tuple[str, str, str]:
    """(English name, Spanish singular, Spanish plural): "every Sunday" -> "todos los domingos"."""
    return choose(rng, WEEKDAYS)


def price(rng: random.Random) -> Pair:
    """("€12.50", "12,50 €"): in Spain the euro sign follows the amount, after a space."""
    euros = choose(rng, (4, 6, 8, 9, 12, 15, 19, 24, 29, 49))
    cents = choose(rng, (0, 50, 90, 99))
    amount = euros + cents / 100
    return f"€{grammar.english_decimal(amount, 2)}", f"{grammar.spanish_decimal(amount, 2)} €"


def duration(rng: random.Random, unit_en: str, unit_es: str, counts: Sequence[int]) -> Pair:
    """("1 day", "1 día") or ("30 days", "30 días"); ``unit_es`` is given as singular,plural."""
    value = choose(rng, counts)
    singular_es, plural_es = unit_es.split(",")
    return (
        f"{grammar.english_integer(value)} {unit_en if value == 1 else unit_en + 's'}",
        f"{grammar.spanish_integer(value)} {singular_es if value == 1 else plural_es}",
    )


DAYS = ("day", "día,días")
MINUTES_UNIT = ("minute", "minuto,minutos")
HOURS = ("hour", "hora,horas")
SECONDS = ("second", "segundo,segundos")
