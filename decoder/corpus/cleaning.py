"""Dropping sentence pairs that would hurt word alignment, decided from token counts alone.

Rules (checked in this order, the first that applies is the reason): an empty source side, an empty target
side, a side longer than ``max_tokens``, and sides whose lengths differ by more than ``max_length_ratio``
(longer / shorter). Long pairs are slow for EM (the E-step of IBM Model 1 costs source x target per pair) and
rarely align well; very unequal lengths usually mean the two sides are not translations of each other. The
defaults, 80 tokens and a ratio of 9, are common practice for phrase-based training corpora, not values from a
paper. The caller tokenizes (this module knows nothing about tokens), so the same rules serve any tokenizer.
"""

from __future__ import annotations

from collections.abc import Iterable
from dataclasses import dataclass, field
from enum import StrEnum

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError

DEFAULT_MAX_TOKENS = 80  # common practice
DEFAULT_MAX_LENGTH_RATIO = 9.0  # common practice
KEEP_CODE = -1  # ``CleaningRules.classify`` code for a pair that is kept


class DropReason(StrEnum):
    """Why a pair was dropped; the values are stable and appear in summaries and manifests."""

    EMPTY_SOURCE = "empty_source"
    EMPTY_TARGET = "empty_target"
    TOO_LONG = "too_long"
    LENGTH_RATIO = "length_ratio"
    # Decided by the tokenizer, not by counts: a side with control characters the text layer refuses.
    INVALID_TEXT = "invalid_text"


DROP_REASONS: tuple[DropReason, ...] = tuple(DropReason)  # classify() code k means DROP_REASONS[k]


@dataclass(frozen=True, slots=True)
class CleaningRules:
    """Limits on one pair: at most ``max_tokens`` tokens per side, longer side / shorter side at most
    ``max_length_ratio``. Both limits are inclusive (a pair exactly at the limit is kept)."""

    max_tokens: int = DEFAULT_MAX_TOKENS
    max_length_ratio: float = DEFAULT_MAX_LENGTH_RATIO

    def __post_init__(self) -> None:
        if self.max_tokens < 1:
            raise ConfigurationError(f"max_tokens is {self.max_tokens}; it must be at least 1")
        if not self.max_length_ratio >= 1.0:  # also rejects NaN
            raise ConfigurationError(f"max_length_ratio is {self.max_length_ratio}; it must be at least 1")

    def reason(self, num_source_tokens: int, num_target_tokens: int) -> DropReason | None:
        """Why the pair should be dropped, or None to keep it."""
        if num_source_tokens == 0:
            return DropReason.EMPTY_SOURCE
        if num_target_tokens == 0:
            return DropReason.EMPTY_TARGET
        if max(num_source_tokens, num_target_tokens) > self.max_tokens:
            return DropReason.TOO_LONG
        # Compare by multiplication so the test is exact for integer counts (no rounding of a quotient).
        longer, shorter = max(num_source_tokens, num_target_tokens), min(num_source_tokens, num_target_tokens)
        if longer > self.max_length_ratio * shorter:
            return DropReason.LENGTH_RATIO
        return None

    def classify(self, num_source_tokens: npt.ArrayLike, num_target_tokens: npt.ArrayLike) -> npt.NDArray[np.int8]:
        """``reason`` for arrays of counts: KEEP_CODE (-1) or the index of the reason in DROP_REASONS."""
        source = np.asarray(num_source_tokens, dtype=np.int64)
        target = np.asarray(num_target_tokens, dtype=np.int64)
        longer, shorter = np.maximum(source, target), np.minimum(source, target)
        conditions = [  # one per DropReason, in its order, so condition k has code k
            source == 0,
            target == 0,
            longer > self.max_tokens,
            longer > self.max_length_ratio * shorter,
            np.zeros(source.shape, dtype=bool),  # INVALID_TEXT: never from counts
        ]
        codes = list(range(len(DROP_REASONS)))
        return np.select(conditions, codes, default=KEEP_CODE).astype(np.int8)  # the first true condition wins


@dataclass(slots=True)
class CleaningReport:
    """Running counts of one cleaning pass; reports of shards ``merge`` into the report of the whole corpus.

    Invariant: ``num_read == num_kept + sum(num_dropped.values())``."""

    num_read: int = 0
    num_kept: int = 0
    num_dropped: dict[DropReason, int] = field(default_factory=lambda: dict.fromkeys(DropReason, 0))

    def record(self, reason: DropReason | None) -> None:
        """Count one pair, kept (``reason`` None) or dropped for ``reason``."""
        self.num_read += 1
        if reason is None:
            self.num_kept += 1
        else:
            self.num_dropped[reason] += 1

    def record_codes(self, codes: npt.ArrayLike) -> None:
        """Count many pairs at once from ``CleaningRules.classify`` codes."""
        values = np.asarray(codes, dtype=np.int64)
        counts = np.bincount(values + 1, minlength=len(DROP_REASONS) + 1)  # slot 0 is KEEP_CODE
        self.num_read += int(values.size)
        self.num_kept += int(counts[0])
        for reason, count in zip(DROP_REASONS, counts[1:].tolist(), strict=True):
            self.num_dropped[reason] += count

    def merge(self, other: CleaningReport) -> CleaningReport:
        """A new report with the counts of both (neither input changes)."""
        return CleaningReport(
            self.num_read + other.num_read,
            self.num_kept + other.num_kept,
            {reason: self.num_dropped[reason] + other.num_dropped[reason] for reason in DropReason},
        )

    @classmethod
    def merged(cls, reports: Iterable[CleaningReport]) -> CleaningReport:
        """The sum of any number of reports (an empty report for none)."""
        total = cls()
        for report in reports:
            total = total.merge(report)
        return total

    def summary_lines(self) -> list[str]:
        """Lines for the command-line summary: pairs read, kept (with share), dropped per reason."""
        kept_share = 100.0 * self.num_kept / self.num_read if self.num_read else 0.0
        lines = [f"pairs read: {self.num_read}", f"pairs kept: {self.num_kept} ({kept_share:.1f}%)"]
        lines += [f"dropped ({reason.value}): {self.num_dropped[reason]}" for reason in DropReason]
        return lines

    def to_dict(self) -> dict[str, int]:
        """Flat counts for the manifest's corpus statistics: ``{"num_read": 10, "empty_source": 1, ...}``."""
        return {"num_read": self.num_read, "num_kept": self.num_kept} | {
            reason.value: self.num_dropped[reason] for reason in DropReason
        }
