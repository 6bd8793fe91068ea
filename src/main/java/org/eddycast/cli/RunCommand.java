package org.eddycast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.report.CurveCsv;
import org.eddycast.report.ResultJson;
import org.eddycast.report.TextSummary;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code run SCENARIO.json}: simulate one scenario and print a short summary. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = "Compute the eddy diffusivity of one scenario and print a summary.")
final class RunCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (JSON).")
    Path scenarioFile;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the full result as JSON.")
    Path json;

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the mean-square-displacement curves as CSV.")
    Path csv;

    @Option(names = "--pdf", paramLabel = "SHEET.pdf", description = "Write the summary sheet as PDF.")
    Path pdf;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Scenario scenario = ScenarioReader.read(scenarioFile);
        ProgressPrinter progress = new ProgressPrinter(err, ProgressPrinter.terminal());
        StudyResult result = Engine.run(scenario, threads.resolve(), progress, new Cancellation());
        progress.finish();
        out.print(TextSummary.of(result));
        if (json != null) {
            AtomicFiles.writeString(json, ResultJson.text(result));
            out.println("result written to " + json);
        }
        if (csv != null) {
            AtomicFiles.writeString(csv, CurveCsv.text(result));
            out.println("curves written to " + csv);
        }
        if (pdf != null) {
            org.eddycast.sheet.SummarySheetPdf.write(result, pdf);
            out.println("summary sheet written to " + pdf);
        }
        out.flush();
        return 0;
    }
}
