package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eddycast.field.VectorSinCos;
import org.eddycast.particles.KernelChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The vector kernel gives the same numbers bit for bit whatever the machine's vector length: each particle's
 * arithmetic is the same in every lane, and the normal generator's eight streams are the same whether a vector
 * holds two, four or eight of them. A second runtime started with half this machine's vector length (the
 * HotSpot option -XX:MaxVectorSize, as on a machine with narrower vectors) runs {@link ReachCase}; its numbers
 * must equal this runtime's.
 */
class VectorWidthTest {

    @TempDir
    Path folder;

    @Test
    void sameNumbersWithHalfTheVectorLength() throws IOException, InterruptedException {
        assumeTrue(KernelChoice.fastest() == KernelChoice.VECTOR, "the vector kernel runs here");
        String arch = System.getProperty("os.arch");
        assumeTrue(arch.equals("amd64") || arch.equals("x86_64"), "the vector length option is x86's");
        int bytes = VectorSinCos.SPECIES.vectorByteSize();
        assumeTrue(bytes >= 32, "a narrower vector than this one still holds two doubles");

        String here = KernelChoice.fastest().newShearKernel().name();
        double[] expected = ReachCase.numbersOf(ReachCase.scenario(), 2);

        Path output = folder.resolve("numbers.txt");
        Process child = new ProcessBuilder(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--add-modules", "jdk.incubator.vector", "-XX:MaxVectorSize=" + bytes / 2, "-Xmx512m",
                "-cp", System.getProperty("java.class.path"), VectorWidthRun.class.getName())
                .redirectError(ProcessBuilder.Redirect.DISCARD)
                .redirectOutput(output.toFile())
                .start();
        boolean finished = child.waitFor(120, TimeUnit.SECONDS);
        if (!finished) {
            child.destroyForcibly();
        }
        assertTrue(finished, "the second runtime finished within two minutes");
        List<String> lines = new ArrayList<>(Files.readAllLines(output, StandardCharsets.UTF_8));
        assertEquals(0, child.exitValue(), "the second runtime's exit status; its output: " + lines);

        String there = lines.remove(0);
        assertEquals("vector " + bytes * 4 + "-bit", there, "the second runtime's kernel");
        assertNotEquals(here, there);
        double[] actual = lines.stream().mapToDouble(h -> Double.longBitsToDouble(Long.parseUnsignedLong(h, 16)))
                .toArray();
        assertArrayEquals(expected, actual, 0.0, "numbers with " + there + " against " + here);
    }
}
