"""Target-side n-gram language model: interpolated modified Kneser-Ney, ARPA input/output, compact queries."""
