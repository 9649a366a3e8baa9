"""Text processing: normalisation, tokenization, placeholder protection, casing, detokenization."""
