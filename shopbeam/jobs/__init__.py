"""Job files: the reader (TOML to a typed, validated Job), comment-keeping edits, atomic locked storage and the preset library."""
