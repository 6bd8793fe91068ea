package org.eddycast.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The files one command will write, checked before any simulation so a long run is never lost to a path that
 * could not have worked: every output's folder exists and can be written, no output is a folder, no output is
 * an input of the same command (the scenario or the record would be replaced), and no two outputs are the same
 * file (one would silently overwrite the other). Paths are compared after resolving "." and "..", and as the
 * same file on disk when both exist (links).
 */
final class OutputPlan {

    private final Map<String, Path> outputs = new LinkedHashMap<>();
    private final Map<String, Path> inputs = new LinkedHashMap<>();

    /** An output, named by the option that gives it ("--json"); null paths are ignored. */
    OutputPlan output(String option, Path path) {
        if (path != null) {
            outputs.put(option, path);
        }
        return this;
    }

    /** An input the command reads, named for messages ("the scenario file"). */
    OutputPlan input(String role, Path path) {
        if (path != null) {
            inputs.put(role + " " + path, path);
        }
        return this;
    }

    /**
     * Checks the plan.
     *
     * @throws IllegalArgumentException listing every problem, each naming the option and the file
     */
    void check() {
        List<String> problems = new ArrayList<>();
        List<Map.Entry<String, Path>> seen = new ArrayList<>();
        for (Map.Entry<String, Path> out : outputs.entrySet()) {
            String option = out.getKey();
            Path path = out.getValue();
            Path absolute = path.toAbsolutePath().normalize();
            Path folder = absolute.getParent();
            if (Files.isDirectory(absolute)) {
                problems.add(option + " names a folder, " + path + ": give a file name");
            } else if (folder != null && !Files.isDirectory(folder)) {
                problems.add(option + " " + path + ": the folder " + folder + " does not exist (create it or "
                        + "choose another folder)");
            } else if (folder != null && !Files.isWritable(folder)) {
                problems.add(option + " " + path + ": the folder " + folder + " cannot be written (choose a folder "
                        + "you may write to)");
            }
            for (Map.Entry<String, Path> in : inputs.entrySet()) {
                if (same(path, in.getValue())) {
                    problems.add(option + " names " + in.getKey() + ", an input of this command: it would be "
                            + "replaced; choose another file");
                }
            }
            for (Map.Entry<String, Path> earlier : seen) {
                if (same(path, earlier.getValue())) {
                    problems.add(earlier.getKey() + " and " + option + " name the same file, " + path
                            + ": one would overwrite the other; give each its own file");
                }
            }
            seen.add(out);
        }
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("\n", problems));
        }
    }

    /** The paths of the outputs, in the order given. */
    List<Path> outputs() {
        return List.copyOf(outputs.values());
    }

    static boolean same(Path a, Path b) {
        Path x = a.toAbsolutePath().normalize();
        Path y = b.toAbsolutePath().normalize();
        if (x.equals(y)) {
            return true;
        }
        try {
            return Files.exists(x) && Files.exists(y) && Files.isSameFile(x, y);
        } catch (IOException e) {
            return false;
        }
    }
}
