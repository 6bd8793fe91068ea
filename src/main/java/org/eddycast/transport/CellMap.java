package org.eddycast.transport;

/**
 * A partition of a region into cells, each with the share of the region's volume (or of the section's area)
 * a tracer spread evenly would put in it: the cells over which mixing is judged.
 */
public interface CellMap {

    /** Number of cells. */
    int cells();

    /** The cell holding the point, 0 to cells() - 1. */
    int cellOf(double x, double y, double z);

    /** The fraction of an evenly spread tracer that lies in cell k; the fractions add up to 1. */
    double share(int k);
}
