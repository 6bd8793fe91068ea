package org.eddycast.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.particles.Cancellation;
import org.eddycast.report.OptionComparison;
import org.eddycast.report.ResultJson;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.Printable;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code compare A.json B.json ...}: design options side by side with a plain verdict. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = "Run two or more scenarios (the options of one design question) and compare them.")
final class CompareCommand implements Callable<Integer> {

    @Parameters(arity = "2..*", paramLabel = "SCENARIO", description = "Scenario files, two or more.")
    List<Path> scenarios;

    @Option(names = "--json", paramLabel = "FILE", description = "Write every option's result and the verdict as JSON.")
    Path json;

    @Option(names = "--pdf", paramLabel = "SHEET.pdf",
            description = "Write the comparison sheet as PDF: the options side by side, overlaid widths, the verdict.")
    Path pdf;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        // every file is read and every output checked before anything is simulated
        OutputPlan plan = new OutputPlan().output("--json", json).output("--pdf", pdf);
        List<Scenario> read = new ArrayList<>();
        for (Path p : scenarios) {
            read.add(readNamed(p));
            plan.input("the scenario file", p);
        }
        plan.check();
        for (Scenario s : read) {
            BeforeRun.show(err, s, true);
        }
        List<StudyResult> results = new ArrayList<>();
        for (Scenario s : read) {
            ProgressPrinter progress = ProgressPrinter.start(err);
            try {
                results.add(Engine.run(s, threads.resolve(), progress, new Cancellation()));
            } finally {
                progress.finish();
            }
        }
        out.printf(Locale.ROOT, "%-48s %12s %12s %12s %s%n", "option", "D_x m^2/s", "D_y m^2/s", "D_z m^2/s",
                "first mixing figure");
        for (StudyResult r : results) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-48.48s",
                    Printable.escape(r.scenario().name())));
            for (AxisEstimate a : r.diffusivity().axes()) {
                row.append(a.determined() ? String.format(Locale.ROOT, " %12.4g", a.diffusivity().value())
                        : String.format(Locale.ROOT, " %12s", "not determined"));
            }
            if (r.forecast() != null && !r.forecast().mixing().isEmpty()) {
                var m = r.forecast().mixing().get(0);
                row.append(String.format(Locale.ROOT, " %s %.4g %s", m.name(), m.value(), m.unit()));
            }
            if (r.diffusivity().fromCache()) {
                row.append(" (simulation reused: same dimensionless case)");
            }
            out.println(row);
        }
        List<String> names = results.stream().map(r -> r.scenario().name()).toList();
        List<String> verdict = List.of(OptionComparison.of(names, results).verdict());
        verdict.forEach(out::println);
        out.println();
        Cautions.lines("").forEach(out::println);
        Saves saves = new Saves(out);
        saves.save("comparison", json, () -> {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode root = mapper.createObjectNode();
            ArrayNode options = root.putArray("options");
            results.forEach(r -> options.add(ResultJson.of(r)));
            ArrayNode v = root.putArray("verdict");
            verdict.forEach(v::add);
            AtomicFiles.writeString(json, mapper.writeValueAsString(root));
        });
        saves.save("comparison sheet", pdf, () -> org.eddycast.sheet.SummarySheetPdf.writeOptions(names, results, pdf));
        return saves.finish(err);
    }

    /** Reads one option's scenario; a problem is reported with the file's name. */
    private static Scenario readNamed(Path p) throws java.io.IOException {
        try {
            return ScenarioReader.read(p);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(p + ": " + e.getMessage(), e);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new IllegalArgumentException("no such file: " + p, e);
        }
    }
}
