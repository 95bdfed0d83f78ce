"""Design checks of a solved member: limit states, load states (patterned, moving), capacity and sizing, and `analyze`."""
