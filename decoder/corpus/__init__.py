"""Streaming readers for parallel corpora (plain pair, TSV, TMX, gettext PO/MO) and corpus cleaning."""
