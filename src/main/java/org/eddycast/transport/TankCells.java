package org.eddycast.transport;

/**
 * Equal-volume cells of a cylinder: rings of equal area, sectors, and layers.
 */
public final class TankCells implements CellMap {

    private final double radius;
    private final double height;
    private final int rings;
    private final int sectors;
    private final int layers;

    public TankCells(double radius, double height, int rings, int sectors, int layers) {
        this.radius = radius;
        this.height = height;
        this.rings = rings;
        this.sectors = sectors;
        this.layers = layers;
    }

    @Override
    public int cells() {
        return rings * sectors * layers;
    }

    @Override
    public int cellOf(double x, double y, double z) {
        double f = (x * x + y * y) / (radius * radius);
        int ring = Math.min(rings - 1, (int) (f * rings));
        double angle = Math.atan2(y, x) / (2 * Math.PI) + 0.5;
        int sector = Math.min(sectors - 1, (int) (angle * sectors));
        int layer = Math.max(0, Math.min(layers - 1, (int) (z / height * layers)));
        return (ring * sectors + sector) * layers + layer;
    }

    @Override
    public double share(int k) {
        return 1.0 / cells();
    }
}
