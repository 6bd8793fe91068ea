package org.eddycast.report;

import java.util.Locale;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TransportResult;

/** The transport stage's figures as lines of the text summary. */
final class TransportText {

    private TransportText() {
    }

    static void append(StringBuilder sb, TransportResult result) {
        if (result instanceof ChannelStageResult c) {
            sb.append(String.format(Locale.ROOT, "  transport stage (particles through the section, %d particles,"
                    + " %.1f s):%n", c.particles(), c.elapsedSeconds()));
            line(sb, "longitudinal dispersion coefficient", c.longitudinalDispersion(), "m^2/s");
            line(sb, "transverse diffusivity (section mean)", c.transverseDiffusivity(), "m^2/s");
            line(sb, "vertical diffusivity (section mean)", c.verticalDiffusivity(), "m^2/s");
            double[] skew = c.skewness();
            sb.append(String.format(Locale.ROOT, "    along-flow skewness: %.2f at %.4g s, %.2f at the end (%.4g s)%n",
                    skew[skew.length / 10], c.times()[skew.length / 10], skew[skew.length - 1], c.duration()));
            for (String w : c.warnings()) {
                sb.append("    WARNING: ").append(w).append('\n');
            }
            for (String n : c.notes()) {
                sb.append("    note: ").append(n).append('\n');
            }
        } else if (result instanceof TankStageResult t) {
            sb.append(String.format(Locale.ROOT, "  transport stage (particles round the circulation, %d particles,"
                    + " %.1f s):%n", t.particles(), t.elapsedSeconds()));
            String[] names = {"blend time 90%", "blend time 95%", "blend time 99%"};
            for (int i = 0; i < names.length; i++) {
                line(sb, names[i], t.blendTimes().get(i), "s");
            }
            sb.append(String.format(Locale.ROOT, "    circulation time V / (N_Q N D^3): %.4g s; the 95%% blend time is"
                    + " %.3g of them; each loop carries %.3g m^3/s against the impeller's %.3g m^3/s%n",
                    t.circulationTime(), t.blendTime95().value() / t.circulationTime(), t.loopFlow(),
                    t.discharge()));
            sb.append(String.format(Locale.ROOT, "    mean velocity gradient G = %.4g 1/s (G t at the 95%% blend time:"
                    + " %.4g)%n", t.velocityGradient(), t.velocityGradient() * t.blendTime95().value()));
            for (TankStageResult.Probe p : t.probes()) {
                line(sb, "probe " + p.name() + ", 95%", p.blendTimes().get(1), "s");
            }
            for (String w : t.warnings()) {
                sb.append("    WARNING: ").append(w).append('\n');
            }
            for (String n : t.notes()) {
                sb.append("    note: ").append(n).append('\n');
            }
        }
    }

    private static void line(StringBuilder sb, String name, Estimate e, String unit) {
        if (!e.determined()) {
            sb.append("    ").append(name).append(": not determined (").append(e.note()).append(")\n");
            return;
        }
        sb.append(String.format(Locale.ROOT, "    %s: %.4g %s [%.4g, %.4g]%s%n", name, e.value(), unit, e.low(),
                e.high(), e.note().isEmpty() ? "" : " (" + e.note() + ")"));
    }
}
