"""Settings of phrase-table training, one frozen record saved with the model's training settings."""

from __future__ import annotations

from dataclasses import dataclass

from decoder.errors import ConfigurationError
from decoder.phrases.encoding import MAX_SUPPORTED_PHRASE_LENGTH


@dataclass(frozen=True, slots=True)
class PhraseSettings:
    """How phrase pairs are extracted, counted, scored and pruned.

    ``max_phrase_length`` bounds both sides, in tokens (7 is common practice; at most 8, the width of the
    packed internal alignment). ``max_targets_per_source`` keeps that many target phrases per source phrase,
    best by phrase_fwd + lex_fwd (common practice; None keeps all). ``drop_singletons`` removes pairs seen
    once. ``reordering_smoothing`` is the sigma of add-sigma smoothing towards the global orientation
    distribution (0.5 is common practice). ``segments_per_shard`` sizes the map step; when the counted rows
    held in memory exceed ``max_rows_in_memory`` they are merged and spilled to .npy files under ``spill_dir``
    (a fresh temporary directory when None)."""

    max_phrase_length: int = 7
    max_targets_per_source: int | None = 20
    drop_singletons: bool = False
    reordering_smoothing: float = 0.5
    segments_per_shard: int = 20_000
    max_rows_in_memory: int = 10_000_000  # about 1 GB of counted rows
    spill_dir: str | None = None

    def __post_init__(self) -> None:
        if not 1 <= self.max_phrase_length <= MAX_SUPPORTED_PHRASE_LENGTH:
            raise ConfigurationError(
                f"max_phrase_length is {self.max_phrase_length}; it must be between 1 and "
                f"{MAX_SUPPORTED_PHRASE_LENGTH} tokens."
            )
        if self.max_targets_per_source is not None and self.max_targets_per_source < 1:
            raise ConfigurationError(
                "max_targets_per_source must be at least 1, or None to keep every target."
            )
        if not self.reordering_smoothing > 0:
            raise ConfigurationError("reordering_smoothing must be positive (0.5 is common practice).")
        if self.segments_per_shard < 1:
            raise ConfigurationError("segments_per_shard must be at least 1.")
        if self.max_rows_in_memory < 1:
            raise ConfigurationError("max_rows_in_memory must be at least 1.")
