"""shopbeam: beam checks for fabrication shops."""

import os as _os

# The systems solved here are small (a few dozen unknowns): one BLAS thread is fastest, and
# a second thread on a busy 2-core machine only adds latency. Respect a value already set.
_os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")

__version__ = "0.1.0"
