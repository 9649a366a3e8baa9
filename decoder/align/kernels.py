"""Compiled inner loops of the alignment E-steps (numba), each with its numpy reference in the calling module.

A compiled loop fuses what numpy does in separate passes (gather, row sums, division, ``np.bincount``) into one
pass over the cells, with the parameter and its count side by side in memory so that the random access of a
cell touches one cache line instead of two. Tests check each kernel against the numpy reference.

Compiled code is cached next to this file (``__pycache__``), so worker processes load it instead of compiling.
"""

from __future__ import annotations

import numpy as np
import numpy.typing as npt
from numba import njit


@njit(cache=True, nogil=True)
def _model1_runs(cells, widths, starts, num_rows, table):  # pragma: no cover - compiled
    log_likelihood = 0.0
    product = 1.0  # of row totals not yet logged: one log per many rows instead of one per row
    for run in range(len(widths)):
        width, start = widths[run], starts[run]
        log_likelihood -= num_rows[run] * np.log(width)
        for row in range(num_rows[run]):
            base = start + row * width
            total = 0.0
            for k in range(width):
                total += table[cells[base + k], 0]
            inverse = 1.0 / total
            for k in range(width):
                cell = cells[base + k]
                table[cell, 1] += table[cell, 0] * inverse
            if total < 1e-100:  # keeps the product clear of underflow (totals are at most the width)
                log_likelihood += np.log(total)
                continue
            product *= total
            if product < 1e-200 or product > 1e200:
                log_likelihood += np.log(product)
                product = 1.0
    return log_likelihood + np.log(product)


@njit(cache=True, nogil=True)
def _gather_parameters(probabilities, table_rows, table):  # pragma: no cover - compiled
    for local in range(len(table_rows)):
        table[local, 0] = probabilities[table_rows[local]]
        table[local, 1] = 0.0


def model1_counts(
    cells: npt.NDArray[np.int32], runs: list[tuple[int, int, int]], probabilities: npt.NDArray[np.float64],
    table_rows: npt.NDArray[np.int32],
) -> tuple[npt.NDArray[np.float64], float]:
    """Model 1 E-step over (width, start, rows) runs of cells, whose local row k is row ``table_rows[k]`` of
    ``probabilities``: expected counts per local row and the log-likelihood
    sum_j log sum_i t(e_j | f_i) - J log(I + 1)."""
    table = np.empty((len(table_rows), 2))
    _gather_parameters(probabilities, table_rows, table)
    run_array = np.array(runs, dtype=np.int64).reshape(-1, 3)
    log_likelihood = _model1_runs(cells, run_array[:, 0], run_array[:, 1], run_array[:, 2], table)
    return np.ascontiguousarray(table[:, 1]), float(log_likelihood)
