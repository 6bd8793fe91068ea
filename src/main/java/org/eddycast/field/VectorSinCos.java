package org.eddycast.field;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * Constants of the vector sine and cosine, whose method is written out inside each vector kernel loop.
 *
 * <p>Method, lane by lane: the kernels take the phase in turns, t = (k / 2 pi) . x, from wavevectors stored
 * over 2 pi. The nearest whole number of turns is found by adding and removing 1.5 * 2^52 (which rounds to
 * the nearest integer for |t| below 2^51), and the fraction f = t - rint(t), in [-1/2, 1/2], is exact, so the
 * reduction costs three additions and no multiplication. Then 2 sin(pi f) = f P(f^2) and
 * cos(pi f) = Q(f^2) by Horner's rule with fused multiply-adds ({@link FastSinCos#TURN_SINE},
 * {@link FastSinCos#TURN_COSINE}), and the double-angle formulas give sin(2 pi f) = (2 sin(pi f)) cos(pi f)
 * and cos(2 pi f) = (2 cos(pi f)) cos(pi f) - 1. Floating-point arithmetic only: no quadrant bits, no
 * reinterpretation of lanes.
 *
 * <p>Accuracy: within 1e-13 absolute of the sine and cosine of 2 pi t for the turn phase t as the kernel forms
 * it (tested for |t| up to 1e5); that phase carries the rounding of its dot product, as a phase in radians
 * does, plus that of k / 2 pi: a relative error of a few units in the last place, below 1e-13 for phases up
 * to a few hundred radians (tested through the kernels).
 *
 * <p>Why written out: the JIT turns Vector API calls into machine vectors only when it inlines them all into
 * one compiled loop; helper methods taking vectors may be compiled apart, early and with a thin profile, and
 * then every vector is boxed on the heap. Each kernel loop is therefore one flat method, and a small one: the
 * JIT stops inlining once a compiled method grows past a fixed size in its intermediate form, and a vector
 * operation left out in that way again puts every vector on the heap (a run then goes three times slower,
 * by chance, depending on the profile the JIT saw).
 *
 * <p>Every loop over the modes counts from zero by one and derives the mode from the count, also when it
 * sweeps the modes backwards: the JIT optimizes fully only such counted loops. Written as
 * {@code for (m = first; m != stop; m += direction)} the same passes ran the Lie drift at 58% (one
 * realization per particle, 26 vector loads per mode) and 73% (shared realizations) of the counted loop's
 * speed (JMH, one core).
 */
public final class VectorSinCos {

    public static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    /** Longs in a vector of the same shape, for the bit operations. */
    public static final VectorSpecies<Long> LONGS = SPECIES.withLanes(long.class);
    public static final DoubleVector MINUS_ONE = DoubleVector.broadcast(SPECIES, -1.0);
    /** 1.5 * 2^52. */
    public static final DoubleVector ROUNDER = DoubleVector.broadcast(SPECIES, 6755399441055744.0);
    public static final DoubleVector TS0 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[0]);
    public static final DoubleVector TS1 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[1]);
    public static final DoubleVector TS2 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[2]);
    public static final DoubleVector TS3 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[3]);
    public static final DoubleVector TS4 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[4]);
    public static final DoubleVector TS5 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[5]);
    public static final DoubleVector TS6 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_SINE[6]);
    public static final DoubleVector TC0 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[0]);
    public static final DoubleVector TC1 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[1]);
    public static final DoubleVector TC2 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[2]);
    public static final DoubleVector TC3 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[3]);
    public static final DoubleVector TC4 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[4]);
    public static final DoubleVector TC5 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[5]);
    public static final DoubleVector TC6 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[6]);
    public static final DoubleVector TC7 = DoubleVector.broadcast(SPECIES, FastSinCos.TURN_COSINE[7]);

    private VectorSinCos() {
    }
}
