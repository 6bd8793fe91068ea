package org.eddycast.transport;

/**
 * Counts, per block and record, the particles near each station along a channel: in fine bins of width
 * {@code fineWidth} centred on the station, {@code 2 halfBins + 1} of them, once over the whole section and once
 * within the strip across that holds the station's lateral position (when it has one). After the run
 * {@link StationCurves} merges the fine bins into the bin width each record calls for. Storage: blocks x records
 * x stations x bins x 2 integers, each block writing only its own slice, so the counts are the same whatever the
 * thread count.
 */
public final class StationCounts implements TransportRecorder {

    private final double[] distance;
    private final int[] strip;
    private final double width;
    private final int strips;
    private final double fineWidth;
    private final int halfBins;
    private final int records;
    private final int[][] counts;
    private final int[] blockSize;

    /**
     * @param distance  each station's distance downstream of the release (m)
     * @param strip     each station's strip across (0 to strips - 1), or -1 for the cross-section mean only
     * @param width     the channel's width (m), for the strip of a particle
     * @param strips    strips across the width
     * @param fineWidth width of a fine bin along the flow (m)
     * @param halfBins  fine bins each side of the station's own
     */
    public StationCounts(double[] distance, int[] strip, double width, int strips, double fineWidth, int halfBins,
                         int blocks, int records) {
        if (distance.length != strip.length) {
            throw new IllegalArgumentException("one strip per station; got " + distance.length + " stations and "
                    + strip.length + " strips");
        }
        if (!(fineWidth > 0) || halfBins < 0) {
            throw new IllegalArgumentException("fine bin width must be positive and half bins at least 0; got "
                    + fineWidth + " and " + halfBins);
        }
        this.distance = distance.clone();
        this.strip = strip.clone();
        this.width = width;
        this.strips = strips;
        this.fineWidth = fineWidth;
        this.halfBins = halfBins;
        this.records = records;
        this.counts = new int[blocks][records * distance.length * bins() * 2];
        this.blockSize = new int[blocks];
    }

    @Override
    public void record(int block, int record, double[] x, double[] y, double[] z, int count) {
        int[] slice = counts[block];
        int bins = bins();
        int stations = distance.length;
        double perMetre = 1 / fineWidth;
        for (int i = 0; i < count; i++) {
            int s = Math.max(0, Math.min(strips - 1, (int) (y[i] / width * strips)));
            for (int k = 0; k < stations; k++) {
                long bin = Math.round((x[i] - distance[k]) * perMetre) + halfBins;
                if (bin < 0 || bin >= bins) {
                    continue;
                }
                int o = ((record * stations + k) * bins + (int) bin) * 2;
                slice[o]++;
                if (strip[k] == s) {
                    slice[o + 1]++;
                }
            }
        }
        blockSize[block] = count;
    }

    /** Fine bins per station. */
    public int bins() {
        return 2 * halfBins + 1;
    }

    public int halfBins() {
        return halfBins;
    }

    public double fineWidth() {
        return fineWidth;
    }

    public int stations() {
        return distance.length;
    }

    public double distance(int station) {
        return distance[station];
    }

    public int strip(int station) {
        return strip[station];
    }

    public int blocks() {
        return counts.length;
    }

    public int records() {
        return records;
    }

    public int blockSize(int block) {
        return blockSize[block];
    }

    /**
     * Particles of block b at record j within {@code reach} fine bins of station k (the station's own bin and
     * {@code reach} each side), over the whole section or, with {@code inStrip}, in the station's strip only.
     */
    public int near(int b, int j, int k, int reach, boolean inStrip) {
        int bins = bins();
        int base = ((j * distance.length + k) * bins) * 2 + (inStrip ? 1 : 0);
        int sum = 0;
        for (int i = halfBins - reach; i <= halfBins + reach; i++) {
            sum += counts[b][base + 2 * i];
        }
        return sum;
    }
}
