"""Decoding: translation options per source span, future costs, stack search with recombination and cube
pruning, n-best extraction, and the Translator entry point. Imports phrases/, lm/, text/ and terminology/."""
