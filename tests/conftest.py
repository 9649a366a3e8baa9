"""Shared fixtures. Module-specific fixtures live in the test modules that use them."""
