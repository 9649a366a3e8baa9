"""The models this service translates with: loaded once at start-up (before gunicorn forks, so the memory-mapped
arrays are shared by all workers), each with its Translator and a JSON description for GET /v1/models."""

from __future__ import annotations

import dataclasses
from collections.abc import Sequence
from dataclasses import dataclass
from pathlib import Path

from decoder.errors import ConfigurationError
from decoder.search.translator import Translator
from decoder.translation_model import TranslationModel, load_translation_model
from service.errors import ApiError


@dataclass(frozen=True, slots=True)
class LoadedModel:
    model: TranslationModel
    translator: Translator

    @property
    def model_id(self) -> str:
        return self.model.model_id


def describe(model: TranslationModel) -> dict[str, object]:
    """Languages, features, weights, search defaults and training facts of ``model`` (GET /v1/models/{id})."""
    manifest = model.manifest
    search_defaults = {
        key: (str(value) if key == "algorithm" else value)
        for key, value in dataclasses.asdict(model.search_defaults).items()
    }
    return {
        "id": model.model_id,
        "source_language": model.source_language,
        "target_language": model.target_language,
        "feature_names": list(manifest.get("feature_names", [])),
        "weights": model.weights,
        "search_defaults": search_defaults,
        "statistics": dict(manifest.get("statistics", {})),
        "training": dict(manifest.get("training", {})),
        "created": manifest.get("created"),
    }


class ModelRegistry:
    def __init__(self, models: Sequence[LoadedModel]) -> None:
        if not models:
            raise ConfigurationError("no models to serve: set PHRASEWORK_MODEL_DIRS (or pass --model)")
        self._models: dict[str, LoadedModel] = {}
        for loaded in models:
            if loaded.model_id in self._models:
                raise ConfigurationError(
                    f"two models have the id {loaded.model_id!r}; model ids must be unique "
                    "(the id is the manifest's model_id or the folder name)"
                )
            self._models[loaded.model_id] = loaded

    @classmethod
    def load(cls, model_dirs: Sequence[Path], verify: bool = True) -> ModelRegistry:
        """Load every model directory (ModelLoadError names a missing or corrupt file)."""
        loaded = []
        for path in model_dirs:
            model = load_translation_model(path, verify=verify)
            loaded.append(LoadedModel(model, Translator(model)))
        return cls(loaded)

    @property
    def ids(self) -> list[str]:
        return list(self._models)

    def __iter__(self):
        return iter(self._models.values())

    def get(self, model_id: str) -> LoadedModel:
        loaded = self._models.get(model_id)
        if loaded is None:
            raise ApiError(404, "model_not_found", f"No model {model_id!r}; loaded: {', '.join(self._models)}.")
        return loaded

    def resolve(self, model_id: str | None) -> LoadedModel:
        """The requested model, or the only one when none is named; 400 if several are loaded and none named."""
        if model_id is not None:
            return self.get(model_id)
        if len(self._models) == 1:
            return next(iter(self._models.values()))
        raise ApiError(
            400,
            "invalid_request",
            "Several models are loaded; name one in 'model'.",
            {"model": [f"required when several models are loaded: {', '.join(self._models)}"]},
        )

    def default_languages(self) -> tuple[str, str] | None:
        """(source, target) when every loaded model has the same pair, else None."""
        pairs = {(loaded.model.source_language, loaded.model.target_language) for loaded in self._models.values()}
        return next(iter(pairs)) if len(pairs) == 1 else None
