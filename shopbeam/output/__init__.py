"""Renderers of results: the text report and the exact calc sheet."""
