package org.eddycast.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.engine.VerificationCase;
import org.eddycast.engine.VerificationSuite;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;

/** {@code check}: run the built-in verification cases and print expected value, estimate and verdict. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Run the built-in verification flows against their exact or published diffusivities; "
                + "exit 1 if any fails.")
final class CheckCommand implements Callable<Integer> {

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.printf(Locale.ROOT, "%-44s %10s %10s %23s %7s  %s%n", "case (dimensionless, U = k = 1)", "expected",
                "estimate", "95% interval", "z", "verdict");
        int failures = 0;
        for (VerificationCase c : VerificationSuite.cases()) {
            VerificationSuite.Outcome o = VerificationSuite.run(c, threads.resolve(), RunListener.NONE,
                    new Cancellation());
            out.printf(Locale.ROOT, "%-44s %10.5f %10.5f [%10.5f, %10.5f] %7.2f  %s (%s)%n", c.name(), c.expected(),
                    o.estimate().value(), o.estimate().low(), o.estimate().high(), o.deviationInErrors(),
                    o.passed() ? "pass" : "FAIL", o.reason());
            out.flush();
            if (!o.passed()) {
                failures++;
            }
        }
        out.println();
        for (VerificationCase c : VerificationSuite.cases()) {
            out.println("  " + c.name() + ": " + c.source());
        }
        out.printf(Locale.ROOT, "%d of %d checks passed%n", VerificationSuite.cases().size() - failures,
                VerificationSuite.cases().size());
        return failures == 0 ? 0 : 1;
    }
}
