"""The beam engine: the singularity-function solve, piecewise polynomials and the self-checks. Pure numpy; knows nothing of units, sections or job files."""
