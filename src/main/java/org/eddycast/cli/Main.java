package org.eddycast.cli;

import java.io.IOException;
import java.io.PrintWriter;
import org.eddycast.engine.ToolVersion;
import org.eddycast.particles.NumericalBlowupException;
import org.eddycast.particles.RunCancelledException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The command line: {@code run}, {@code check} and {@code bench}. Exit status 0 when done, 2 for bad input
 * (a message on standard error, no stack trace), 1 for an internal fault.
 */
@Command(name = "eddycast", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Screening forecasts of tracer spreading in turbulent tanks and channels.",
        subcommands = {RunCommand.class, CompareCommand.class, AnalyzeCommand.class, CheckCommand.class, BenchCommand.class, MemoryCommand.class,
            SweepCommand.class})
public final class Main implements Runnable, CommandLine.IExitCodeGenerator {

    /** Exit status for bad input. */
    public static final int BAD_INPUT = 2;
    /** Exit status for an internal fault. */
    public static final int FAULT = 1;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The summary sheet the no-argument run writes when there is no display. */
    static final java.nio.file.Path HEADLESS_SHEET = java.nio.file.Path.of("eddycast-summary.pdf");

    public static void main(String[] args) {
        if (args.length == 0 && !java.awt.GraphicsEnvironment.isHeadless()) {
            // the window: built on the event thread by the standalone host; the process ends when it closes
            org.eddycast.plugin.StandaloneHost.open(org.eddycast.ui.EddycastPlugin.ID, false);
            return;
        }
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the command line with the given streams and returns the exit status. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cmd = new CommandLine(new Main());
        cmd.setOut(out);
        cmd.setErr(err);
        cmd.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            if (outOfMemory(e)) {
                err.println("eddycast: " + OUT_OF_MEMORY);
                return FAULT;
            }
            if (e instanceof IllegalArgumentException || e instanceof IOException
                    || e instanceof org.eddycast.measure.RecordFormatException
                    || e instanceof NumericalBlowupException) {
                err.println("eddycast: " + message(e));
                return BAD_INPUT;
            }
            if (e instanceof RunCancelledException) {
                err.println("eddycast: cancelled");
                return FAULT;
            }
            err.println("eddycast: internal fault: " + e);
            e.printStackTrace(err);
            return FAULT;
        });
        try {
            return cmd.execute(args);
        } catch (OutOfMemoryError e) {
            err.println("eddycast: " + OUT_OF_MEMORY);
            return FAULT;
        }
    }

    /** What to do when the heap is too small, said plainly instead of with a stack trace. */
    static final String OUT_OF_MEMORY = "out of memory: the run needs more memory than the Java heap allows; give "
            + "it more (java -Xmx4g ...) or ask for fewer particles or modes (simulation.particles, "
            + "simulation.modes, simulation.maxParticles)";

    /** True when the failure is, or was caused by, running out of memory (a worker thread's included). */
    static boolean outOfMemory(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof OutOfMemoryError) {
                return true;
            }
            if (t.getCause() == t) {
                break;
            }
        }
        return false;
    }

    private static String message(Exception e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file: " + e.getMessage();
        }
        return e.getMessage() == null ? e.toString() : e.getMessage();
    }

    /**
     * With no arguments and no display: runs the bundled preset, prints its summary and writes the summary
     * sheet, so the first command shows the main job anywhere.
     */
    @Override
    public void run() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        out.println("No display: running the bundled preset " + org.eddycast.scenario.BundledPresets.STANDARD_NAME
                + " in the terminal (eddycast --help lists the commands).");
        out.flush();
        // the sheet goes to the working folder: checked first, so an unwritable folder costs no run
        new OutputPlan().output("the summary sheet", HEADLESS_SHEET).check();
        org.eddycast.scenario.Scenario s = org.eddycast.scenario.BundledPresets.standard();
        BeforeRun.show(err, s, false);
        ProgressPrinter progress = ProgressPrinter.start(err);
        org.eddycast.engine.StudyResult r;
        try {
            r = org.eddycast.engine.Engine.run(s, org.eddycast.engine.Engine.defaultThreads(), progress,
                    new org.eddycast.particles.Cancellation());
        } finally {
            progress.finish();
        }
        out.print(org.eddycast.report.TextSummary.of(r));
        Saves saves = new Saves(out);
        saves.save("summary sheet", HEADLESS_SHEET.toAbsolutePath(),
                () -> org.eddycast.sheet.SummarySheetPdf.write(r, HEADLESS_SHEET));
        exitStatus = saves.finish(err);
    }

    /** The exit status of the no-argument run (picocli's Runnable cannot return one). */
    private int exitStatus;

    @Override
    public int getExitCode() {
        return exitStatus;
    }

    /** The version for --version. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"eddycast " + ToolVersion.get()};
        }
    }
}
