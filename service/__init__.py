"""HTTP layer of phrasework (thin: schemas, routes, glossary store, auth, limits, metrics); see README.md here.

It imports ``decoder``; ``decoder`` never imports it. gunicorn loads ``service.wsgi:create_app()``; nothing
is imported here, so ``python -m service.keys`` and ``python -m service.launcher`` start without Flask.
"""
