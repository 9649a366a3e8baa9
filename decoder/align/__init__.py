"""Word alignment: IBM Model 1 and the HMM model in both directions, then symmetrization.

Imports only numpy, ``decoder.segment_arrays``, ``decoder.executor`` and ``decoder.vocabulary``.
"""
