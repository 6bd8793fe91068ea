package org.eddycast.field;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * Constants of the vector sine and cosine, and its method, written out inside each vector kernel loop.
 *
 * <p>Method, lane by lane, as in {@link FastSinCos}: the nearest whole number q of quarter turns is found by
 * adding and removing 1.5 * 2^52 (which rounds to the nearest integer for |phase| below 2^51 and leaves q in
 * the low bits of the sum); Cody-Waite reduction r = phase - q pi/2 with a two-part constant (Cody and Waite
 * 1980, Software Manual for the Elementary Functions, Prentice-Hall, ch. 8); Taylor polynomials of degree 15
 * (sine) and 16 (cosine) on [-pi/4, pi/4] by Horner's rule with fused multiply-adds; and a branch-free
 * quadrant select on the bit patterns: sine and cosine swapped where q is odd (a masked exclusive-or), signs
 * flipped by the sign bit where bit 1 of q (sine) or of q + 1 (cosine) is set.
 *
 * <p>Accuracy: within 2e-15 absolute of {@link Math#sin} and {@link Math#cos} for |phase| up to 1e6 (tested
 * through the kernels); beyond about 2^20 pi/2 the two-part constant loses accuracy, far beyond the phases the
 * engine produces.
 *
 * <p>Why written out: the JIT turns Vector API calls into machine vectors only when it inlines them all into
 * one compiled loop; helper methods taking vectors may be compiled apart, early and with a thin profile, and
 * then every vector is boxed on the heap. Each kernel loop is therefore one flat method.
 */
public final class VectorSinCos {

    public static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    public static final DoubleVector TWO_OVER_PI = DoubleVector.broadcast(SPECIES, 2.0 / Math.PI);
    /** 1.5 * 2^52. */
    public static final DoubleVector ROUNDER = DoubleVector.broadcast(SPECIES, 6755399441055744.0);
    public static final DoubleVector MINUS_PIO2_HI = DoubleVector.broadcast(SPECIES, -FastSinCos.PIO2_HI);
    public static final DoubleVector MINUS_PIO2_LO = DoubleVector.broadcast(SPECIES, -FastSinCos.PIO2_LO);
    public static final DoubleVector ONE = DoubleVector.broadcast(SPECIES, 1.0);
    public static final DoubleVector S3 = DoubleVector.broadcast(SPECIES, -1.0 / 6.0);
    public static final DoubleVector S5 = DoubleVector.broadcast(SPECIES, 1.0 / 120.0);
    public static final DoubleVector S7 = DoubleVector.broadcast(SPECIES, -1.0 / 5040.0);
    public static final DoubleVector S9 = DoubleVector.broadcast(SPECIES, 1.0 / 362880.0);
    public static final DoubleVector S11 = DoubleVector.broadcast(SPECIES, -1.0 / 39916800.0);
    public static final DoubleVector S13 = DoubleVector.broadcast(SPECIES, 1.0 / 6227020800.0);
    public static final DoubleVector S15 = DoubleVector.broadcast(SPECIES, -1.0 / 1307674368000.0);
    public static final DoubleVector C2 = DoubleVector.broadcast(SPECIES, -0.5);
    public static final DoubleVector C4 = DoubleVector.broadcast(SPECIES, 1.0 / 24.0);
    public static final DoubleVector C6 = DoubleVector.broadcast(SPECIES, -1.0 / 720.0);
    public static final DoubleVector C8 = DoubleVector.broadcast(SPECIES, 1.0 / 40320.0);
    public static final DoubleVector C10 = DoubleVector.broadcast(SPECIES, -1.0 / 3628800.0);
    public static final DoubleVector C12 = DoubleVector.broadcast(SPECIES, 1.0 / 479001600.0);
    public static final DoubleVector C14 = DoubleVector.broadcast(SPECIES, -1.0 / 87178291200.0);
    public static final DoubleVector C16 = DoubleVector.broadcast(SPECIES, 1.0 / 20922789888000.0);

    private VectorSinCos() {
    }
}
