package org.eddycast.reliability;

import org.eddycast.particles.KernelChoice;

/**
 * Runs {@link ReachCase} on two threads and prints the kernel's name, then every number of the result as the
 * hexadecimal form of its bits, one a line: what {@link VectorWidthTest} compares across vector widths.
 */
public final class VectorWidthRun {

    public static void main(String[] args) {
        System.out.println(KernelChoice.fastest().newShearKernel().name());
        for (double v : ReachCase.numbersOf(ReachCase.scenario(), 2)) {
            System.out.println(Long.toHexString(Double.doubleToRawLongBits(v)));
        }
    }

    private VectorWidthRun() {
    }
}
