"""What a member is made of: section calculators, the shape catalog, materials, wall gauges and shop stock lists."""
