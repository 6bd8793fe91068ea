package org.eddycast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eddycast.particles.Cancellation;
import org.eddycast.propagation.SweepFiles;
import org.eddycast.propagation.SweepPart;
import org.eddycast.propagation.SweepPlan;
import org.eddycast.propagation.SweepSummary;
import org.eddycast.report.UncertaintyJson;
import org.eddycast.report.UncertaintyText;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.uncertainty.UncertaintySummary;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sweep SCENARIO.json [--shard K/N] --out FILE}: runs the sampled scenarios of the scenario's input ranges,
 * all of them or one shard; {@code sweep --merge PART.json... --out RESULT.json} merges shards. A shard needs
 * only the jar, the scenario and its number, so any batch system can run shards side by side; merged parts give
 * the same result, to the bit, as the unsplit sweep.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = {"Run a scenario over its input ranges (its \"uncertainty\" block), whole or one shard at a "
                + "time, and rank the inputs by their share of the main figure's variance.",
                "  sweep SCENARIO.json --out RESULT.json          the whole sweep",
                "  sweep SCENARIO.json --shard K/N --out PART.json  shard K of N (K from 1)",
                "  sweep --merge PART.json... --out RESULT.json     merge the N parts"})
final class SweepCommand implements Callable<Integer> {

    private static final Pattern SHARD = Pattern.compile("(\\d{1,6})/(\\d{1,6})");

    @ArgGroup(exclusive = true, multiplicity = "1")
    Mode mode;

    static final class Mode {
        @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (JSON) with input ranges.")
        Path scenarioFile;

        @Option(names = "--merge", arity = "1..*", paramLabel = "PART", description = "Merge these parts.")
        List<Path> parts;
    }

    @Option(names = "--shard", paramLabel = "K/N", description = "Run shard K of N (K from 1 to N).")
    String shard;

    @Option(names = "--out", required = true, paramLabel = "FILE",
            description = "Where to write the part (with --shard) or the result.")
    Path out;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (mode.parts != null) {
            if (shard != null) {
                throw new ParameterException(spec.commandLine(), "--shard runs a shard; --merge merges them: give one");
            }
            return merge(stdout);
        }
        Scenario scenario = ScenarioReader.read(mode.scenarioFile);
        SweepPlan plan = new SweepPlan(scenario);
        int k = 1;
        int n = 1;
        if (shard != null) {
            Matcher m = SHARD.matcher(shard.trim());
            if (!m.matches() || Integer.parseInt(m.group(2)) < 1 || Integer.parseInt(m.group(1)) < 1
                    || Integer.parseInt(m.group(1)) > Integer.parseInt(m.group(2))) {
                throw new ParameterException(spec.commandLine(), "--shard must be K/N with 1 <= K <= N, such as 3/16; "
                        + "got " + shard);
            }
            k = Integer.parseInt(m.group(1));
            n = Integer.parseInt(m.group(2));
        }
        new OutputPlan().input("the scenario file", mode.scenarioFile).output("--out", out).check();
        plan.prepare();
        int from = plan.shardStart(k, n);
        int to = plan.shardEnd(k, n);
        err.printf("sweep: %d inputs, %d runs in all; this %s runs rows %d to %d (%d runs)%n", plan.inputs().size(),
                plan.rows(), shard == null ? "sweep" : "shard " + k + "/" + n, from, to - 1, to - from);
        err.flush();
        ProgressPrinter progress = ProgressPrinter.start(err);
        SweepPart part;
        try {
            part = plan.run(from, to, threads.resolve(), f -> progress.progress(f, null), new Cancellation());
        } finally {
            progress.finish();
        }
        err.printf("sweep: the field stage was simulated %d times for these %d runs (the others share a "
                + "dimensionless case)%n", plan.fieldSimulations(), to - from);
        Saves saves = new Saves(stdout);
        if (shard != null) {
            saves.save("sweep part", out, () -> SweepFiles.write(part, out));
        } else {
            // the whole sweep goes through the same text a part does, so it equals any merge of its shards
            Merged result = merged(List.of(SweepFiles.parse(SweepFiles.text(part))));
            stdout.print(result.summary());
            saves.save("sweep result", out, () -> AtomicFiles.writeString(out, result.text()));
        }
        return saves.finish(err);
    }

    private int merge(PrintWriter stdout) throws Exception {
        List<SweepPart> parts = new ArrayList<>();
        for (Path p : mode.parts) {
            parts.add(SweepFiles.read(p));
        }
        new OutputPlan().output("--out", out).check();
        Merged result;
        try {
            result = merged(parts);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "cannot merge: " + e.getMessage());
        }
        stdout.print(result.summary());
        Saves saves = new Saves(stdout);
        saves.save("sweep result", out, () -> AtomicFiles.writeString(out, result.text()));
        return saves.finish(spec.commandLine().getErr());
    }

    /** The merged result of parts: the same parts give the same text. */
    static Merged merged(List<SweepPart> parts) {
        if (parts.isEmpty()) {
            throw new IllegalArgumentException("no parts");
        }
        Scenario scenario = ScenarioReader.parse(parts.get(0).scenario());
        SweepPlan plan = new SweepPlan(scenario);
        UncertaintySummary u = SweepSummary.summarise(plan, SweepSummary.merge(plan, parts), null);
        return new Merged(UncertaintyJson.sweepResult(scenario.name(), plan.fingerprint(), u),
                UncertaintyText.resultLines(u, scenario.forecast().units()));
    }

    /**
     * A merged sweep.
     *
     * @param text    the result file's JSON text
     * @param summary what standard output says of it
     */
    record Merged(String text, String summary) {
    }
}
