"""marshmallow schemas of every request and response body; ``service.openapi`` generates the API document
from the same classes, so the document cannot drift from what is validated.

Request schemas reject unknown fields (``unknown = RAISE``: a misspelt field is an error, not silently
ignored) and integers given as floats or strings (``strict=True``). Limits that the operator configures
(segments per request, characters per segment, n_best) are baked into the request schema by
``translation_request_schema(limits)``, so the document shows the limits the running service applies.
"""

from __future__ import annotations

from collections.abc import Sequence

from marshmallow import RAISE, Schema, fields, validate

from decoder.search.features import FEATURE_NAMES
from decoder.search.settings import SearchAlgorithm, TermMode
from decoder.terminology.glossary import MAX_TERM_CHARACTERS, TermStatus
from decoder.terminology.store import GLOSSARY_NAME
from service.config import Limits

# BCP 47 language tag, shape only (RFC 5646 section 2.1: primary subtag of 2-3 letters, then subtags of 1-8
# letters or digits); "es", "pt-BR", "es-419", "zh-Hant-TW".
BCP47_TAG = r"^[A-Za-z]{2,3}(-[A-Za-z0-9]{1,8})*$"
GLOSSARY_NAME_PATTERN = "^" + GLOSSARY_NAME.pattern + "$"
INCLUDE_PARTS = ("features", "segmentation", "alignment")
MAX_GLOSSARIES_PER_REQUEST = 10
MAX_INLINE_TERMS = 1000
MAX_UPLOAD_ROWS = 200_000  # glossary_from_rows allows two rows per entry at most


class StrictSchema(Schema):
    class Meta:
        unknown = RAISE
        ordered = True


def _language(**kwargs: object) -> fields.String:
    return fields.String(
        validate=validate.Regexp(BCP47_TAG, error="Not a BCP 47 language tag such as 'en' or 'pt-BR'."), **kwargs
    )


# -- translation request --------------------------------------------------------------------------------


class SearchSchema(StrictSchema):
    """Per-request search settings; omitted ones keep the model's defaults (GET /v1/models/{id})."""

    algorithm = fields.String(
        validate=validate.OneOf([item.value for item in SearchAlgorithm]),
        metadata={"description": "cube: cube pruning (Huang & Chiang 2007); stack: expand every hypothesis"},
    )
    stack_size = fields.Integer(
        strict=True,
        validate=validate.Range(1, 1000),
        metadata={"description": "hypotheses kept per stack (histogram pruning)"},
    )
    beam_width = fields.Float(
        validate=validate.Range(min=0, max=100, min_inclusive=False),
        metadata={"description": "threshold pruning, in model-score units (natural log)"},
    )
    distortion_limit = fields.Integer(
        strict=True,
        validate=validate.Range(-1, 50),
        metadata={"description": "largest jump in source words; 0 monotone, -1 unlimited"},
    )
    cube_pop_limit = fields.Integer(
        strict=True, validate=validate.Range(1, 10000), metadata={"description": "cube-pruning pops per stack"}
    )
    max_options_per_span = fields.Integer(
        strict=True,
        validate=validate.Range(1, 100),
        metadata={"description": "translation options kept per source span"},
    )


WeightsSchema = StrictSchema.from_dict(
    {name: fields.Float(metadata={"description": f"weight of feature {name}"}) for name in FEATURE_NAMES},
    name="WeightsSchema",
)
WeightsSchema.__doc__ = "Feature weights overriding the model's for this request, by feature name."
FeaturesSchema = Schema.from_dict({name: fields.Float(required=True) for name in FEATURE_NAMES}, name="FeaturesSchema")
FeaturesSchema.__doc__ = "Feature values of one translation (natural logs or counts, see the feature list)."


class InlineTermSchema(StrictSchema):
    """A term for this request only; it is matched before the named glossaries."""

    source = fields.String(required=True, validate=validate.Length(1, MAX_TERM_CHARACTERS))
    target = fields.String(required=True, validate=validate.Length(1, MAX_TERM_CHARACTERS))
    case_sensitive = fields.Boolean(load_default=False)


def translation_request_schema(limits: Limits, model_ids: Sequence[str] = ()) -> type[Schema]:
    """The POST /v1/translations body schema with the configured limits; ``model_ids`` (the loaded models)
    appear as the document's enum for ``model`` (validation still answers 404 for any other id)."""
    model_metadata: dict[str, object] = {"description": "model id; optional when one model is loaded"}
    if model_ids:
        model_metadata["enum"] = list(model_ids)
    segment_error = (
        f"The segment is longer than {limits.max_segment_characters} characters. Split the text into sentences first."
    )
    count_error = (
        f"Send between 1 and {limits.max_segments} segments per request; split larger batches into several requests."
    )

    class TranslationRequestSchema(StrictSchema):
        """What to translate and how. Results come back one per segment, in order."""

        segments = fields.List(
            fields.String(validate=validate.Length(max=limits.max_segment_characters, error=segment_error)),
            required=True,
            validate=validate.Length(1, limits.max_segments, error=count_error),
            metadata={"description": "raw text, one segment (sentence or UI string) each; no line breaks"},
        )
        model = fields.String(validate=validate.Length(1, 200), metadata=model_metadata)
        n_best = fields.Integer(strict=True, load_default=1, validate=validate.Range(1, limits.max_n_best))
        glossaries = fields.List(
            fields.String(validate=validate.Regexp(GLOSSARY_NAME_PATTERN)),
            load_default=list,
            validate=validate.Length(max=MAX_GLOSSARIES_PER_REQUEST),
            metadata={"description": "glossary names, earlier ones win overlapping terms"},
        )
        terms = fields.List(
            fields.Nested(InlineTermSchema), load_default=list, validate=validate.Length(max=MAX_INLINE_TERMS)
        )
        term_mode = fields.String(
            load_default=TermMode.ENFORCE.value,
            validate=validate.OneOf([mode.value for mode in TermMode]),
            metadata={
                "description": "enforce: matched terms must be translated by the "
                "glossary; prefer: the glossary option competes; off: "
                "matched and reported only"
            },
        )
        include = fields.List(
            fields.String(validate=validate.OneOf(INCLUDE_PARTS)),
            load_default=lambda: ["features"],
            metadata={"description": "optional parts of each result"},
        )
        search = fields.Nested(SearchSchema, load_default=dict)
        weights = fields.Nested(WeightsSchema, load_default=dict)

    return TranslationRequestSchema


# -- translation response -------------------------------------------------------------------------------


def _pair(description: str) -> fields.List:
    return fields.List(
        fields.Integer(),
        required=True,
        validate=validate.Length(2, 2),
        metadata={"description": description + " [start, end), end exclusive"},
    )


class PhraseSpanSchema(Schema):
    source_tokens = _pair("source token positions")
    target_tokens = _pair("output token positions")
    source_characters = _pair("characters of the normalised source")
    target_characters = _pair("characters of the translation")


class WordLinkSchema(Schema):
    source_token = fields.Integer(required=True)
    target_token = fields.Integer(required=True)
    source_characters = _pair("characters of the normalised source")
    target_characters = _pair("characters of the translation")


class NBestEntrySchema(Schema):
    text = fields.String(required=True)
    score = fields.Float(required=True, metadata={"description": "sum over features of weight x value"})
    features = fields.Nested(FeaturesSchema, metadata={"description": "present when include has 'features'"})


class ForbiddenTargetSchema(Schema):
    target = fields.String(required=True)
    output_span = _pair("characters of the translation")


class TermReportSchema(Schema):
    """One glossary term found in the source, and what became of it."""

    source_span = _pair("characters of the normalised source")
    source_text = fields.String(required=True)
    entry_source = fields.String(required=True, metadata={"description": "the glossary's spelling"})
    glossary = fields.String(required=True)
    origin = fields.String(required=True, metadata={"description": "where the entry is defined"})
    mode = fields.String(required=True, validate=validate.OneOf([mode.value for mode in TermMode]))
    target = fields.String(required=True, allow_none=True)
    in_output = fields.Boolean(
        required=True, metadata={"description": "an allowed target is in the output (under mode off too: produced "
                                                "by the model on its own)"}
    )
    output_span = fields.List(fields.Integer(), required=True, allow_none=True)
    reason = fields.String(
        required=True, allow_none=True, metadata={"description": "null when the term was applied, else why not"}
    )
    forbidden_in_output = fields.List(fields.Nested(ForbiddenTargetSchema), required=True)


class SegmentResultSchema(Schema):
    source = fields.String(required=True, metadata={"description": "the segment as normalised for the model"})
    translation = fields.String(required=True)
    n_best = fields.List(fields.Nested(NBestEntrySchema), required=True)
    terms = fields.List(fields.Nested(TermReportSchema), required=True)
    num_pieces = fields.Integer(required=True, metadata={"description": ">1 when a long segment was split"})
    segmentation = fields.List(fields.Nested(PhraseSpanSchema), metadata={"description": "of the best translation"})
    alignment = fields.List(fields.Nested(WordLinkSchema), metadata={"description": "of the best translation"})


class TranslationResponseSchema(Schema):
    model = fields.String(required=True)
    weights = fields.Nested(FeaturesSchema, required=True, metadata={"description": "the weights used"})
    results = fields.List(fields.Nested(SegmentResultSchema), required=True)
    elapsed_ms = fields.Float(required=True)
    notice = fields.String(required=True)


# -- models ---------------------------------------------------------------------------------------------


class ModelSchema(Schema):
    id = fields.String(required=True)
    source_language = fields.String(required=True)
    target_language = fields.String(required=True)
    feature_names = fields.List(fields.String(), required=True)
    weights = fields.Dict(keys=fields.String(), values=fields.Float(), required=True)
    search_defaults = fields.Dict(required=True)
    statistics = fields.Dict(required=True)
    training = fields.Dict(required=True)
    created = fields.String(required=True, allow_none=True)


class ModelListSchema(Schema):
    models = fields.List(fields.Nested(ModelSchema), required=True)


# -- glossaries -----------------------------------------------------------------------------------------


class GlossaryRowSchema(StrictSchema):
    """One (source, target) pair; rows with the same source give alternatives."""

    source = fields.String(required=True, validate=validate.Length(1, MAX_TERM_CHARACTERS))
    target = fields.String(required=True, validate=validate.Length(1, MAX_TERM_CHARACTERS))
    status = fields.String(
        load_default=TermStatus.PREFERRED.value, validate=validate.OneOf([status.value for status in TermStatus])
    )
    case_sensitive = fields.Boolean(load_default=False)
    note = fields.String(load_default="", validate=validate.Length(max=10_000))
    mode = fields.String(
        validate=validate.OneOf([mode.value for mode in TermMode]),
        metadata={"description": "overrides the request's term_mode for this entry"},
    )


class GlossaryUploadSchema(StrictSchema):
    """PUT body as application/json. TSV and TBX uploads give the languages as query parameters instead."""

    source_language = _language(required=True)
    target_language = _language(required=True)
    entries = fields.List(fields.Nested(GlossaryRowSchema), required=True, validate=validate.Length(1, MAX_UPLOAD_ROWS))


class GlossaryWarningSchema(Schema):
    kind = fields.String(required=True)
    origin = fields.String(required=True)
    message = fields.String(required=True)


class GlossaryInfoSchema(Schema):
    name = fields.String(required=True)
    kind = fields.String(
        required=True,
        validate=validate.OneOf(["built_in", "uploaded"]),
        metadata={"description": "built_in glossaries are files on the server, read-only"},
    )
    version = fields.String(required=True, metadata={"description": "the ETag value, without quotes"})
    source_language = fields.String(
        required=True, allow_none=True, metadata={"description": "null for built-in files: they take the model's"}
    )
    target_language = fields.String(required=True, allow_none=True)
    num_entries = fields.Integer(required=True, allow_none=True)
    created = fields.String(required=True, allow_none=True)
    updated = fields.String(required=True, allow_none=True)


class GlossaryListSchema(Schema):
    glossaries = fields.List(fields.Nested(GlossaryInfoSchema), required=True)


class GlossaryRowOutSchema(Schema):
    source = fields.String(required=True)
    target = fields.String(required=True)
    status = fields.String(required=True)
    case_sensitive = fields.Boolean(required=True)
    note = fields.String(required=True)
    mode = fields.String()


class GlossaryDetailSchema(GlossaryInfoSchema):
    entries = fields.List(fields.Nested(GlossaryRowOutSchema), required=True)
    warnings = fields.List(fields.Nested(GlossaryWarningSchema), required=True)


class GlossaryPutResultSchema(GlossaryInfoSchema):
    warnings = fields.List(
        fields.Nested(GlossaryWarningSchema),
        required=True,
        metadata={"description": "problems that did not stop the upload (duplicates, conflicts)"},
    )


class MatchRequestSchema(StrictSchema):
    """Text to check (several lines allowed); languages default to the loaded model's when there is one."""

    text = fields.String(required=True, validate=validate.Length(max=500_000))
    source_language = _language()
    target_language = _language()
    inflection_tolerance = fields.Boolean(
        load_default=False, metadata={"description": "also match regular plurals of terms"}
    )


class TermMatchSchema(Schema):
    line = fields.Integer(required=True, metadata={"description": "1-based line of the text"})
    start = fields.Integer(required=True, metadata={"description": "character offset in the normalised line"})
    end = fields.Integer(required=True)
    text = fields.String(required=True, metadata={"description": "the matched source text"})
    entry_source = fields.String(required=True)
    targets = fields.List(fields.String(), required=True, metadata={"description": "allowed, preferred first"})
    forbidden_targets = fields.List(fields.String(), required=True)
    case_sensitive = fields.Boolean(required=True)
    mode = fields.String(required=True, allow_none=True)
    note = fields.String(required=True)
    origin = fields.String(required=True)
    is_inflected = fields.Boolean(required=True)


class MatchResponseSchema(Schema):
    glossary = fields.String(required=True)
    version = fields.String(required=True)
    matches = fields.List(fields.Nested(TermMatchSchema), required=True)


# -- operations and errors ------------------------------------------------------------------------------


class ErrorBodySchema(Schema):
    code = fields.String(required=True, metadata={"description": "stable machine-readable code"})
    message = fields.String(required=True, metadata={"description": "for people: what went wrong, what to do"})
    fields_ = fields.Dict(
        keys=fields.String(),
        values=fields.List(fields.String()),
        required=True,
        data_key="fields",
        attribute="fields",
        metadata={"description": "field path (segments.3, search.stack_size) -> messages"},
    )
    request_id = fields.String(required=True, allow_none=True)


class ErrorSchema(Schema):
    error = fields.Nested(ErrorBodySchema, required=True)


class HealthSchema(Schema):
    status = fields.String(required=True)


class ReadinessSchema(Schema):
    status = fields.String(required=True, validate=validate.OneOf(["ready", "not_ready"]))
    models = fields.List(fields.String(), required=True)
    database = fields.String(required=True)
