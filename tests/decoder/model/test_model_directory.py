"""Model directory: round trip, memory mapping, checks on load, and writes that are interrupted."""

from __future__ import annotations

import hashlib
import json
import os
import subprocess
import sys
import textwrap
from pathlib import Path

import numpy as np
import pytest

import decoder.model.model_directory as model_directory
from decoder.errors import ModelLoadError
from decoder.model import MODEL_FORMAT_VERSION, ModelExistsError, load_model, write_model

REPO_ROOT = Path(__file__).resolve().parents[3]

MANIFEST = {
    "source_language": "es",
    "target_language": "en",
    "feature_names": ["phrase_fwd", "phrase_bwd", "lm"],
    "weights": [0.2, 0.2, 0.5],
    "corpus": {"num_segments": 3, "note": "Ñandú Parts Ltd. help-desk strings"},
}


def sample_arrays() -> dict[str, np.ndarray]:
    # Built by hand so the expected contents do not come from the code under test.
    return {
        "offsets": np.array([0, 2, 5], dtype=np.int64),
        "target_phrase_ids": np.array([7, 1, 3, 3, 9], dtype=np.int32),
        "feature_values": np.array([[-0.5, -1.0, -2.25], [-3.0, -0.125, 0.0]], dtype=np.float32),
        "fortran_order": np.asfortranarray(np.arange(6, dtype=np.int16).reshape(2, 3)),
        "strided": np.arange(10, dtype=np.float64)[::3],  # not contiguous: saved as [0, 3, 6, 9]
        "flags": np.array([True, False, True]),
        "scalar": np.array(4.5),
        "empty": np.zeros((0, 2), dtype=np.int32),
        "tokens": np.array(["casa", "é"], dtype="<U4"),
    }


def corrupt_one_byte(path: Path, position_from_end: int = 1) -> None:
    data = bytearray(path.read_bytes())
    data[-position_from_end] ^= 0xFF
    path.write_bytes(bytes(data))


@pytest.fixture
def model_dir(tmp_path: Path) -> Path:
    return write_model(tmp_path / "es-en", MANIFEST, sample_arrays())


def test_round_trip_keeps_arrays_and_manifest(model_dir: Path):
    model = load_model(model_dir)
    expected = sample_arrays()
    assert sorted(model.arrays) == sorted(expected)
    for name, array in expected.items():
        assert model[name].dtype == array.dtype, name
        assert model[name].shape == array.shape, name
        assert np.array_equal(model[name], array), name
    assert model["strided"].tolist() == [0.0, 3.0, 6.0, 9.0]  # by hand: 0..9 in steps of 3
    for key, value in MANIFEST.items():
        assert model.manifest[key] == value
    assert model.manifest["format_version"] == MODEL_FORMAT_VERSION


def test_manifest_checksums_are_sha256_of_the_files(model_dir: Path):
    # Reference: hashlib.sha256 over the bytes on disk, and numpy's own .npy reader for every file.
    manifest = json.loads((model_dir / "manifest.json").read_text(encoding="utf-8"))
    for name, entry in manifest["arrays"].items():
        data = (model_dir / entry["file"]).read_bytes()
        assert entry["sha256"] == hashlib.sha256(data).hexdigest(), name
        plain = np.load(model_dir / entry["file"], allow_pickle=False)
        assert [list(plain.shape), plain.dtype.str] == [entry["shape"], entry["dtype"]], name
    model = load_model(model_dir)
    assert model.manifest_sha256 == hashlib.sha256((model_dir / "manifest.json").read_bytes()).hexdigest()


def test_arrays_are_read_only_memory_maps(model_dir: Path):
    model = load_model(model_dir)
    feature_values = model["feature_values"]
    assert type(feature_values) is np.memmap
    assert feature_values.flags.writeable is False
    with pytest.raises(ValueError, match="read-only"):
        feature_values[0, 0] = 1.0


def test_corrupt_byte_is_reported_with_its_file(model_dir: Path):
    broken = model_dir / "target_phrase_ids.npy"
    corrupt_one_byte(broken, position_from_end=4)  # lowest byte of the last little-endian int32
    with pytest.raises(ModelLoadError, match="checksum mismatch") as caught:
        load_model(model_dir)
    assert caught.value.path == str(broken)
    assert str(caught.value).startswith(str(broken))
    assert caught.value.code == "model_load_failed"
    # Without verification the flipped data byte goes unnoticed (that is what verify=False trades away) ...
    assert load_model(model_dir, verify=False)["target_phrase_ids"][-1] == 9 ^ 0xFF  # 246
    # ... but a damaged header is still caught, because every header is parsed and checked.
    corrupt_one_byte(model_dir / "offsets.npy", position_from_end=8 * 3 + 20)
    with pytest.raises(ModelLoadError) as caught:
        load_model(model_dir, verify=False)
    assert caught.value.path == str(model_dir / "offsets.npy")


def test_missing_array_file_is_named(model_dir: Path):
    (model_dir / "feature_values.npy").unlink()
    with pytest.raises(ModelLoadError, match=r"npy: missing \(listed in manifest\.json\)") as caught:
        load_model(model_dir, verify=False)
    assert caught.value.path == str(model_dir / "feature_values.npy")


def test_truncated_file_fails_even_without_verification(model_dir: Path):
    path = model_dir / "feature_values.npy"
    path.write_bytes(path.read_bytes()[:-4])
    with pytest.raises(ModelLoadError) as caught:
        load_model(model_dir, verify=False)
    assert caught.value.path == str(path)


def _edit_manifest(model_dir: Path, edit) -> None:
    path = model_dir / "manifest.json"
    manifest = json.loads(path.read_text(encoding="utf-8"))
    edit(manifest)
    path.write_text(json.dumps(manifest), encoding="utf-8")


@pytest.mark.parametrize(
    ("version", "advice"), [(MODEL_FORMAT_VERSION + 1, "upgrade"), (MODEL_FORMAT_VERSION - 1, "rebuild")]
)
def test_other_format_version_is_refused(model_dir: Path, version: int, advice: str):
    _edit_manifest(model_dir, lambda manifest: manifest.update(format_version=version))
    with pytest.raises(ModelLoadError, match=f"format version {version} .*{advice}") as caught:
        load_model(model_dir)
    assert caught.value.path == str(model_dir / "manifest.json")


def test_shape_that_disagrees_with_the_manifest_is_named(model_dir: Path):
    _edit_manifest(model_dir, lambda manifest: manifest["arrays"]["offsets"].update(shape=[4]))
    with pytest.raises(ModelLoadError, match=r"shape \[3\] dtype <i8 but the manifest says shape \[4\]") as caught:
        load_model(model_dir)
    assert caught.value.path == str(model_dir / "offsets.npy")


def test_manifest_may_not_point_outside_the_directory(model_dir: Path):
    _edit_manifest(model_dir, lambda manifest: manifest["arrays"]["offsets"].update(file="../offsets.npy"))
    with pytest.raises(ModelLoadError, match=r"arrays\.offsets\.file must be a plain file name"):
        load_model(model_dir)


def test_unreadable_manifest_is_reported_with_its_line(tmp_path: Path, model_dir: Path):
    (model_dir / "manifest.json").write_text('{\n  "format_version": 1,\n  "arrays": {,}\n}\n', encoding="utf-8")
    with pytest.raises(ModelLoadError, match=r"manifest\.json: line 3: not valid JSON"):
        load_model(model_dir)
    (tmp_path / "empty").mkdir()
    with pytest.raises(ModelLoadError, match=r"manifest\.json: missing"):
        load_model(tmp_path / "empty")
    with pytest.raises(ModelLoadError, match="no such model directory"):
        load_model(tmp_path / "nowhere")


def test_existing_model_is_kept_unless_forced(model_dir: Path):
    with pytest.raises(ModelExistsError, match="force"):
        write_model(model_dir, {"source_language": "pt"}, {"offsets": np.zeros(1, np.int64)})
    assert load_model(model_dir).manifest["source_language"] == "es"
    write_model(model_dir, {"source_language": "pt"}, {"offsets": np.zeros(1, np.int64)}, force=True)
    replaced = load_model(model_dir)
    assert (replaced.manifest["source_language"], sorted(replaced.arrays)) == ("pt", ["offsets"])
    assert not (model_dir / "feature_values.npy").exists()  # nothing of the old model is left inside
    assert sorted(path.name for path in model_dir.parent.iterdir()) == ["es-en"]  # no hidden leftovers


def test_forced_replace_without_atomic_exchange(model_dir: Path, monkeypatch: pytest.MonkeyPatch):
    # Platforms without renameat2 use move-aside-then-rename; the outcome must be the same.
    monkeypatch.setattr(model_directory, "_exchange", lambda first, second: False)
    write_model(model_dir, {"source_language": "it"}, {"offsets": np.ones(2, np.int64)}, force=True)
    assert load_model(model_dir)["offsets"].tolist() == [1, 1]
    assert sorted(path.name for path in model_dir.parent.iterdir()) == ["es-en"]


def test_force_never_replaces_a_directory_that_is_not_a_model(tmp_path: Path):
    precious = tmp_path / "documents"
    precious.mkdir()
    (precious / "notes.txt").write_text("keep me", encoding="utf-8")
    with pytest.raises(ModelExistsError, match="not a model directory"):
        write_model(precious, {}, {"offsets": np.zeros(1, np.int64)}, force=True)
    assert (precious / "notes.txt").read_text(encoding="utf-8") == "keep me"
    link = tmp_path / "current"
    link.symlink_to(write_model(tmp_path / "v1", {}, {"offsets": np.zeros(1, np.int64)}))
    with pytest.raises(ModelExistsError, match="symbolic link"):
        write_model(link, {}, {"offsets": np.ones(1, np.int64)}, force=True)
    assert load_model(link)["offsets"].tolist() == [0]
    empty = tmp_path / "empty"
    empty.mkdir()
    write_model(empty, {}, {"offsets": np.zeros(1, np.int64)})  # an empty directory holds nothing to lose
    assert load_model(empty)["offsets"].tolist() == [0]


def test_write_abandoned_in_the_middle_keeps_the_previous_model(model_dir: Path, tmp_path: Path):
    def fail_after_first(name: str) -> None:
        raise KeyboardInterrupt  # as if the user pressed Ctrl-C after the first array

    with pytest.raises(KeyboardInterrupt):
        write_model(
            model_dir, {"source_language": "pt"}, sample_arrays(), force=True, on_array_written=fail_after_first
        )
    model = load_model(model_dir)
    assert model.manifest["source_language"] == "es"
    assert np.array_equal(model["feature_values"], sample_arrays()["feature_values"])
    with pytest.raises(KeyboardInterrupt):
        write_model(tmp_path / "fresh", {}, sample_arrays(), on_array_written=fail_after_first)
    assert sorted(path.name for path in tmp_path.iterdir()) == ["es-en"]  # no "fresh", no staging directory


def test_killed_writer_leaves_no_loadable_directory(model_dir: Path):
    # A second process starts replacing the model and is killed (SIGKILL: no clean-up runs) after its first array.
    script = textwrap.dedent(f"""
        import sys, time
        import numpy as np
        from decoder.model import write_model

        def pause(name):
            print(name, flush=True)
            time.sleep(60)

        arrays = {{"first": np.arange(1000), "second": np.arange(1000)}}
        write_model({str(model_dir)!r}, {{"source_language": "pt"}}, arrays, force=True, on_array_written=pause)
    """)
    environment = dict(os.environ, PYTHONPATH=str(REPO_ROOT))
    writer = subprocess.Popen([sys.executable, "-c", script], stdout=subprocess.PIPE, text=True, env=environment)
    try:
        assert writer.stdout is not None
        assert writer.stdout.readline().strip() == "first"
    finally:
        writer.kill()
        writer.wait(timeout=30)
        if writer.stdout is not None:
            writer.stdout.close()
    model = load_model(model_dir)
    assert model.manifest["source_language"] == "es"
    assert sorted(model.arrays) == sorted(sample_arrays())
    leftovers = [path for path in model_dir.parent.iterdir() if path.name != "es-en"]
    assert len(leftovers) == 1 and leftovers[0].name.startswith(".es-en.partial-")
    with pytest.raises(ModelLoadError, match=r"manifest\.json: missing"):
        load_model(leftovers[0])


@pytest.mark.parametrize(
    ("arrays", "message"),
    [
        ({"../escape": np.zeros(1)}, "not a plain file name"),
        ({"Scores": np.zeros(1), "scores": np.zeros(1)}, "differ only in case"),
        ({"objects": np.array([{"a": 1}], dtype=object)}, "dtype object"),
    ],
)
def test_unwritable_arrays_are_refused_before_writing(tmp_path: Path, arrays, message):
    with pytest.raises(ValueError, match=message):
        write_model(tmp_path / "model", {}, arrays)
    assert not (tmp_path / "model").exists()


def test_manifest_must_be_strict_json(tmp_path: Path):
    with pytest.raises(ValueError, match="Out of range float"):
        write_model(tmp_path / "model", {"weights": [float("nan")]}, {"offsets": np.zeros(1)})
    assert list(tmp_path.iterdir()) == []


def test_reserved_manifest_keys_are_recomputed(tmp_path: Path, model_dir: Path):
    # Rewriting a loaded model (as tuning does with new weights) must describe the new files, not the old ones.
    old = load_model(model_dir)
    manifest = dict(old.manifest, weights=[0.3, 0.3, 0.4], format_version=0)
    copy = write_model(tmp_path / "tuned", manifest, {"offsets": np.array([0, 1], dtype=np.int64)})
    reloaded = load_model(copy)
    assert reloaded.manifest["format_version"] == MODEL_FORMAT_VERSION
    assert sorted(reloaded.manifest["arrays"]) == ["offsets"]
    assert reloaded.manifest["weights"] == [0.3, 0.3, 0.4]
