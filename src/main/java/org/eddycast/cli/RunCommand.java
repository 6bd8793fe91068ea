package org.eddycast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.propagation.UncertaintyStudy;
import org.eddycast.report.CurveCsv;
import org.eddycast.report.ResultJson;
import org.eddycast.report.TextSummary;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.MeasuredFlow;
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
        OutputPlan plan = new OutputPlan().input("the scenario file", scenarioFile)
                .output("--json", json).output("--csv", csv).output("--pdf", pdf);
        if (scenario.flow() instanceof MeasuredFlow m) {
            plan.input("the record", m.resolved());
        }
        plan.check();
        BeforeRun.show(err, scenario, false);
        ProgressPrinter progress = ProgressPrinter.start(err);
        StudyResult result;
        try {
            result = UncertaintyStudy.run(scenario, threads.resolve(), progress, new Cancellation());
        } finally {
            progress.finish();
        }
        out.print(TextSummary.of(result));
        Saves saves = new Saves(out);
        saves.save("result", json, () -> AtomicFiles.writeString(json, ResultJson.text(result)));
        saves.save("curves", csv, () -> AtomicFiles.writeString(csv, CurveCsv.text(result)));
        saves.save("summary sheet", pdf, () -> org.eddycast.sheet.SummarySheetPdf.write(result, pdf));
        return saves.finish(err);
    }
}
