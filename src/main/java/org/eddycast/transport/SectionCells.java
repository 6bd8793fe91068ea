package org.eddycast.transport;

/**
 * Cells over a channel's cross-section: strips of equal width across, each cut into layers of equal share of
 * the local depth. An evenly spread tracer puts in each cell its share of the section's area. The cells ignore
 * x, so they judge mixing over the section of the whole cloud, which for a steady release is mixing over the
 * section at the distance U t.
 */
public final class SectionCells implements CellMap {

    private final ChannelTransport model;
    private final int strips;
    private final int layers;
    private final double[] share;

    public SectionCells(ChannelTransport model, int strips, int layers) {
        this.model = model;
        this.strips = strips;
        this.layers = layers;
        this.share = new double[strips * layers];
        double[] stripArea = new double[strips];
        double total = 0;
        int sub = 64;
        for (int a = 0; a < strips; a++) {
            for (int i = 0; i < sub; i++) {
                double y = model.width() * (a + (i + 0.5) / sub) / strips;
                stripArea[a] += model.depthAt(y) * model.width() / strips / sub;
            }
            total += stripArea[a];
        }
        for (int a = 0; a < strips; a++) {
            for (int b = 0; b < layers; b++) {
                share[a * layers + b] = stripArea[a] / total / layers;
            }
        }
    }

    @Override
    public int cells() {
        return strips * layers;
    }

    @Override
    public int cellOf(double x, double y, double z) {
        int a = Math.max(0, Math.min(strips - 1, (int) (y / model.width() * strips)));
        double zeta = 1 + z / model.depthAt(y);
        int b = Math.max(0, Math.min(layers - 1, (int) (zeta * layers)));
        return a * layers + b;
    }

    @Override
    public double share(int k) {
        return share[k];
    }

    public int strips() {
        return strips;
    }

    public int layers() {
        return layers;
    }

    /** The strips across as cells of their own (mixing across the width). */
    public CellMap acrossWidth() {
        return grouped(strips, k -> k / layers);
    }

    /** The layers as cells of their own (mixing over the depth). */
    public CellMap overDepth() {
        return grouped(layers, k -> k % layers);
    }

    private CellMap grouped(int groups, java.util.function.IntUnaryOperator groupOf) {
        double[] s = new double[groups];
        for (int k = 0; k < cells(); k++) {
            s[groupOf.applyAsInt(k)] += share[k];
        }
        SectionCells parent = this;
        return new CellMap() {
            @Override
            public int cells() {
                return groups;
            }

            @Override
            public int cellOf(double x, double y, double z) {
                return groupOf.applyAsInt(parent.cellOf(x, y, z));
            }

            @Override
            public double share(int k) {
                return s[k];
            }
        };
    }
}
