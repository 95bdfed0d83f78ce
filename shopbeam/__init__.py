"""shopbeam: beam checks for fabrication shops."""

__version__ = "0.1.0"
