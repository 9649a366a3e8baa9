"""Model directory: manifest.json plus memory-mappable .npy arrays with checksums."""
