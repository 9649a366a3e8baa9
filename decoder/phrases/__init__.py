"""Phrase pairs: extraction from aligned corpora, counting, scoring, lexicalized reordering."""
