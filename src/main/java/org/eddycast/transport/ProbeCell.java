package org.eddycast.transport;

/**
 * A probe as a two-cell map: a sphere about the probe's point, and the rest of the region. Its share is the
 * sphere's volume inside the region over the region's volume. Mixed within 1 - p at the probe then means
 * the probe's reading within +-(1 - p) of the final value ({@link MixingTimeEstimator}).
 */
public final class ProbeCell implements CellMap {

    private final double px;
    private final double py;
    private final double pz;
    private final double radius2;
    private final double share;

    /**
     * @param share the sphere's volume over the region's, between 0 and 1
     */
    public ProbeCell(double px, double py, double pz, double radius, double share) {
        this.px = px;
        this.py = py;
        this.pz = pz;
        this.radius2 = radius * radius;
        this.share = share;
    }

    @Override
    public int cells() {
        return 2;
    }

    @Override
    public int cellOf(double x, double y, double z) {
        double dx = x - px;
        double dy = y - py;
        double dz = z - pz;
        return dx * dx + dy * dy + dz * dz <= radius2 ? 0 : 1;
    }

    @Override
    public double share(int k) {
        return k == 0 ? share : 1 - share;
    }
}
