"""HTTP layer of phrasework (thin: schemas, routes, glossary store, auth, limits, metrics).

It imports ``decoder``; ``decoder`` never imports it. The application factory arrives with the HTTP service
issue; until then this package is intentionally empty.
"""
