"""A trained model as the decoder uses it: vocabularies, phrase table, language model, truecaser and weights,
saved as one model directory (``decoder.model``) and loaded memory-mapped.

Array names in the directory carry a prefix per part (``phrases.``, ``lm.``, ``source_vocabulary.``,
``target_vocabulary.``, ``truecaser.``), so one manifest lists and checksums them all.
"""

from __future__ import annotations

import json
import os
from collections.abc import Mapping
from dataclasses import dataclass
from pathlib import Path
from typing import Any

import numpy as np

from decoder.errors import ModelLoadError
from decoder.lm.query import LanguageModel
from decoder.model.model_directory import load_model, write_model
from decoder.phrases.table import PhraseTable
from decoder.search.features import DEFAULT_WEIGHTS, FEATURE_NAMES
from decoder.search.settings import SearchSettings
from decoder.text.casing import Truecaser
from decoder.vocabulary import Vocabulary

MODEL_KIND = "phrasework.phrase-based"


def _prefixed(prefix: str, arrays: Mapping[str, np.ndarray]) -> dict[str, np.ndarray]:
    return {f"{prefix}.{name}": array for name, array in arrays.items()}


def _unprefixed(prefix: str, arrays: Mapping[str, np.ndarray]) -> dict[str, np.ndarray]:
    start = len(prefix) + 1
    return {name[start:]: array for name, array in arrays.items() if name.startswith(prefix + ".")}


def _vocabulary_arrays(vocabulary: Vocabulary) -> dict[str, np.ndarray]:
    blob, offsets = vocabulary.to_arrays()
    return {"blob": blob, "offsets": offsets}


@dataclass(frozen=True)
class TranslationModel:
    """Read-only after loading; safe to share between threads, and (memory-mapped) between processes."""

    path: Path | None
    manifest: Mapping[str, Any]
    source_vocabulary: Vocabulary
    target_vocabulary: Vocabulary
    phrase_table: PhraseTable
    language_model: LanguageModel
    truecaser: Truecaser

    @property
    def model_id(self) -> str:
        return str(self.manifest.get("model_id") or (self.path.name if self.path else "model"))

    @property
    def source_language(self) -> str:
        return str(self.manifest["source_language"])

    @property
    def target_language(self) -> str:
        return str(self.manifest["target_language"])

    @property
    def weights(self) -> dict[str, float]:
        return {name: float(value) for name, value in self.manifest.get("weights", DEFAULT_WEIGHTS).items()}

    @property
    def search_defaults(self) -> SearchSettings:
        return SearchSettings(**self.manifest.get("search_defaults", {}))


def save_translation_model(
    out_dir: str | Path, *, manifest: Mapping[str, Any], source_vocabulary: Vocabulary, target_vocabulary: Vocabulary,
    phrase_table: PhraseTable, language_model: LanguageModel, truecaser: Truecaser, force: bool = False,
) -> Path:
    """Write every part into one model directory (atomically, see ``decoder.model.write_model``)."""
    arrays: dict[str, np.ndarray] = {}
    arrays |= _prefixed("phrases", phrase_table.to_arrays())
    arrays |= _prefixed("lm", language_model.to_arrays())
    arrays |= _prefixed("source_vocabulary", _vocabulary_arrays(source_vocabulary))
    arrays |= _prefixed("target_vocabulary", _vocabulary_arrays(target_vocabulary))
    blob, offsets = truecaser.to_arrays()
    arrays |= _prefixed("truecaser", {"blob": blob, "offsets": offsets})
    full_manifest = {"kind": MODEL_KIND, "feature_names": list(FEATURE_NAMES),
                     "weights": dict(DEFAULT_WEIGHTS), **manifest}
    return write_model(out_dir, full_manifest, arrays, force=force)


def load_translation_model(path: str | Path, verify: bool = True) -> TranslationModel:
    """Open a model directory; raises ModelLoadError naming the file that is missing or corrupt."""
    loaded = load_model(path, verify=verify)
    manifest = loaded.manifest
    if manifest.get("kind") != MODEL_KIND:
        raise ModelLoadError(f"{loaded.path / 'manifest.json'}: not a phrasework translation model")
    if list(manifest.get("feature_names", [])) != list(FEATURE_NAMES):
        raise ModelLoadError(f"{loaded.path / 'manifest.json'}: the model's feature names do not match this "
                             "version of phrasework; retrain the model")
    arrays = loaded.arrays
    source = _unprefixed("source_vocabulary", arrays)
    target = _unprefixed("target_vocabulary", arrays)
    truecaser = _unprefixed("truecaser", arrays)
    return TranslationModel(
        path=loaded.path, manifest=manifest,
        source_vocabulary=Vocabulary.from_arrays(source["blob"], source["offsets"]),
        target_vocabulary=Vocabulary.from_arrays(target["blob"], target["offsets"]),
        phrase_table=PhraseTable.from_arrays(_unprefixed("phrases", arrays)),
        language_model=LanguageModel.from_arrays(_unprefixed("lm", arrays)),
        truecaser=Truecaser.from_arrays(truecaser["blob"], truecaser["offsets"]))


def update_manifest(model_dir: str | Path, changes: Mapping[str, Any]) -> None:
    """Replace top-level manifest keys in one atomic step (write a sibling file, then rename over the old one):
    an interrupted update leaves the previous manifest. Array entries and the format version cannot change."""
    path = Path(model_dir) / "manifest.json"
    load_model(model_dir, verify=False)  # must be a model directory now
    manifest = json.loads(path.read_text(encoding="utf-8"))
    forbidden = {"arrays", "format_version"} & set(changes)
    if forbidden:
        raise ValueError(f"cannot change {', '.join(sorted(forbidden))}")
    manifest.update(changes)
    temporary = path.with_name(f".manifest.{os.getpid()}.tmp")
    with open(temporary, "w", encoding="utf-8") as out:
        json.dump(manifest, out, indent=2, ensure_ascii=False, allow_nan=False)
        out.write("\n")
        out.flush()
        os.fsync(out.fileno())
    os.replace(temporary, path)
