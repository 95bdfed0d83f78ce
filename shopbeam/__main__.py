"""Run the command line with `python -m shopbeam`."""

import sys

from shopbeam.cli import main

sys.exit(main())
