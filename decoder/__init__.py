"""phrasework's engine as a library: text processing, corpus reading, training and (later) decoding.

The library never imports the web layer (flask, gunicorn, marshmallow) or ``service``; ruff enforces it.
"""

__version__ = "0.1.0"
