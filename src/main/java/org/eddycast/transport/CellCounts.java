package org.eddycast.transport;

/**
 * Counts the particles of each block in each cell at each record time. Storage: blocks x records x cells
 * integers, each block writing only its own slice.
 */
public final class CellCounts implements TransportRecorder {

    private final CellMap map;
    private final int records;
    private final int[][] counts;

    public CellCounts(CellMap map, int blocks, int records) {
        this.map = map;
        this.records = records;
        this.counts = new int[blocks][records * map.cells()];
    }

    @Override
    public void record(int block, int record, double[] x, double[] y, double[] z, int count) {
        int[] slice = counts[block];
        int base = record * map.cells();
        for (int i = 0; i < count; i++) {
            slice[base + map.cellOf(x[i], y[i], z[i])]++;
        }
    }

    public CellMap map() {
        return map;
    }

    public int blocks() {
        return counts.length;
    }

    public int records() {
        return records;
    }

    /**
     * The same counts over coarser cells: cell k of this map goes to cell {@code group(k)} of {@code coarse}
     * (whose cellOf must agree with that grouping).
     */
    public CellCounts grouped(CellMap coarse, java.util.function.IntUnaryOperator group) {
        CellCounts g = new CellCounts(coarse, counts.length, records);
        int fine = map.cells();
        for (int b = 0; b < counts.length; b++) {
            for (int j = 0; j < records; j++) {
                for (int k = 0; k < fine; k++) {
                    g.counts[b][j * coarse.cells() + group.applyAsInt(k)] += counts[b][j * fine + k];
                }
            }
        }
        return g;
    }

    /** Count of block b in cell k at record j. */
    public int count(int b, int j, int k) {
        return counts[b][j * map.cells() + k];
    }
}
