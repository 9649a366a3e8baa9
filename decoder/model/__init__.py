"""Model directory: manifest.json plus memory-mappable .npy arrays with checksums.

Knows only file and array layouts; imports numpy, the standard library and ``decoder.errors``, nothing else of
the engine, so every trainer can write through it and the translator and service can load through it.
"""

from decoder.model.model_directory import (
    MODEL_FORMAT_VERSION,
    LoadedModel,
    ModelExistsError,
    load_model,
    write_model,
)

__all__ = ["MODEL_FORMAT_VERSION", "LoadedModel", "ModelExistsError", "load_model", "write_model"]
