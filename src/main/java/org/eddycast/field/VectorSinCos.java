package org.eddycast.field;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * Constants of the vector sine and cosine, whose method is written out inside each vector kernel loop.
 *
 * <p>Method, lane by lane, as in {@link FastSinCos}: the nearest whole number q of turns is found by adding and
 * removing 1.5 * 2^52 (which rounds to the nearest integer for |phase / 2 pi| below 2^51); Cody-Waite reduction
 * of the half angle h = phase / 2 - q pi with a two-part constant by fused multiply-adds; sin h = h P(h^2) and
 * cos h = Q(h^2) by Horner's rule with fused multiply-adds; then sin(phase) = (2 sin h) cos h and
 * cos(phase) = (2 cos h) cos h - 1. Floating-point arithmetic only: no quadrant bits, no reinterpretation of
 * lanes.
 *
 * <p>Accuracy: within 2e-13 absolute of {@link Math#sin} and {@link Math#cos} for |phase| up to 1e6 (tested
 * through the kernels).
 *
 * <p>Why written out: the JIT turns Vector API calls into machine vectors only when it inlines them all into
 * one compiled loop; helper methods taking vectors may be compiled apart, early and with a thin profile, and
 * then every vector is boxed on the heap. Each kernel loop is therefore one flat method, and a small one: the
 * JIT stops inlining once a compiled method grows past a fixed size in its intermediate form, and a vector
 * operation left out in that way again puts every vector on the heap (a run then goes three times slower,
 * by chance, depending on the profile the JIT saw).
 */
public final class VectorSinCos {

    public static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    /** Longs in a vector of the same shape, for the bit operations. */
    public static final VectorSpecies<Long> LONGS = SPECIES.withLanes(long.class);
    public static final DoubleVector ONE_OVER_TWO_PI = DoubleVector.broadcast(SPECIES, FastSinCos.ONE_OVER_TWO_PI);
    public static final DoubleVector ONE_OVER_PI = DoubleVector.broadcast(SPECIES, 1.0 / Math.PI);
    public static final DoubleVector HALF = DoubleVector.broadcast(SPECIES, 0.5);
    public static final DoubleVector MINUS_ONE = DoubleVector.broadcast(SPECIES, -1.0);
    /** 1.5 * 2^52. */
    public static final DoubleVector ROUNDER = DoubleVector.broadcast(SPECIES, 6755399441055744.0);
    public static final DoubleVector MINUS_PI_HI = DoubleVector.broadcast(SPECIES, -FastSinCos.PI_HI);
    public static final DoubleVector MINUS_PI_LO = DoubleVector.broadcast(SPECIES, -FastSinCos.PI_LO);
    public static final DoubleVector ONE = DoubleVector.broadcast(SPECIES, 1.0);
    public static final DoubleVector S0 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[0]);
    public static final DoubleVector S1 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[1]);
    public static final DoubleVector S2 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[2]);
    public static final DoubleVector S3 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[3]);
    public static final DoubleVector S4 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[4]);
    public static final DoubleVector S5 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[5]);
    public static final DoubleVector S6 = DoubleVector.broadcast(SPECIES, FastSinCos.SINE[6]);
    public static final DoubleVector C0 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[0]);
    public static final DoubleVector C1 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[1]);
    public static final DoubleVector C2 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[2]);
    public static final DoubleVector C3 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[3]);
    public static final DoubleVector C4 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[4]);
    public static final DoubleVector C5 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[5]);
    public static final DoubleVector C6 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[6]);
    public static final DoubleVector C7 = DoubleVector.broadcast(SPECIES, FastSinCos.COSINE[7]);

    private VectorSinCos() {
    }
}
