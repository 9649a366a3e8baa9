"""Text processing: normalisation, tokenization, placeholder protection, casing, detokenization.

Training and translation call ``pipeline`` only: ``prepare_segment`` / ``model_tokens`` on the way in
(check -> normalise -> tokenize -> protect placeholders -> lowercase) and ``finish_segment`` on the way out
(casing -> restore placeholders -> detokenize). The other modules are the steps: ``normalize``,
``tokenizer`` (with ``languages`` and the abbreviation lists in ``data/``), ``protection``, ``casing``,
``detokenizer``. Language rules are chosen by the primary subtag of a BCP 47 tag; unknown languages get
generic rules.

This package imports only the standard library, numpy and ``decoder.errors``; everything else in the
engine depends on it, never the reverse.
"""
