"""Flask blueprints, one per area of the API; each route validates, calls the library or the store, answers."""
