package org.eddycast.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.JButton;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingWorker;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.VerificationCase;
import org.eddycast.engine.VerificationSuite;
import org.eddycast.particles.Cancellation;

/**
 * Runs verification cases in the background and shows their table, so a reviewer can see that this
 * installation reproduces the exact and published diffusivities. The Self-check action shows it in a dialog
 * with every built-in case; Stop (or closing the dialog) ends the run within a step.
 */
final class SelfCheckPanel extends JPanel {

    private static final List<String> HEADER = List.of("case", "expected", "computed",
            "deviation (standard errors)", "outcome", "source");
    private final TextTable table = new TextTable("selfCheck");
    private final List<List<String>> shown = new ArrayList<>();
    private final JProgressBar bar = new JProgressBar(0, 1000);
    private final Cancellation cancel = new Cancellation();
    private final List<VerificationCase> cases;
    private final int threads;
    private Worker worker;

    SelfCheckPanel(List<VerificationCase> cases, int threads) {
        super(new MigLayout("insets dialog, wrap 3, fill", "[grow,fill][][]", "[grow,fill][]"));
        this.cases = List.copyOf(cases);
        this.threads = threads;
        table.show(new org.eddycast.report.SummaryContent.Table(HEADER, shown));
        // every cell in full: the columns take their widest line and the table scrolls sideways
        add(table.scroll(), "span, w 300:820, h 220");
        bar.setStringPainted(true);
        bar.setString(this.cases.size() + " cases to run");
        add(bar);
        JButton stop = new JButton("Stop");
        stop.setMnemonic('S');
        stop.addActionListener(e -> stop());
        add(stop, "sizegroup b");
        JButton close = new JButton("Close");
        close.setMnemonic('C');
        close.setName("close");
        close.addActionListener(e -> closer.run());
        add(close, "sizegroup b");
    }

    private Runnable closer = () -> { };

    /** What Close does: the dialog sets it to close itself (which also stops the run). */
    void setCloser(Runnable r) {
        closer = r;
    }

    /** Starts the cases in the background. */
    void start() {
        if (worker == null) {
            worker = new Worker();
            // the bar moves while a case runs, not only when it finishes
            worker.addPropertyChangeListener(e -> {
                if ("progress".equals(e.getPropertyName()) && !cancel.isCancelled() && !worker.isDone()) {
                    int percent = (Integer) e.getNewValue();
                    bar.setValue(percent * 10);
                    bar.setString(String.format(Locale.ROOT, "%d%%: case %d of %d", percent,
                            Math.min(cases.size(), shown.size() + 1), cases.size()));
                }
            });
            worker.execute();
        }
    }

    /** Stops within a step. */
    void stop() {
        cancel.cancel();
        bar.setString("Stopped");
    }

    /** True once every case has run or the run was stopped. */
    boolean isDone() {
        return worker != null && worker.isDone();
    }

    /** The table's rows as text. */
    List<List<String>> rows() {
        return table.rows();
    }

    String statusText() {
        return bar.getString();
    }

    private final class Worker extends SwingWorker<Void, Object[]> {

        @Override
        protected Void doInBackground() {
            for (int i = 0; i < cases.size() && !cancel.isCancelled(); i++) {
                int done = i;
                VerificationSuite.Outcome o = VerificationSuite.run(cases.get(i), threads,
                        (f, p) -> setProgress((int) Math.min(100, 100 * (done + f) / cases.size())), cancel);
                publish(new Object[] {o.check().name(), String.format(Locale.ROOT, "%.5g", o.check().expected()),
                        String.format(Locale.ROOT, "%.5g", o.estimate().value()),
                        String.format(Locale.ROOT, "%.2f", o.deviationInErrors()), o.passed() ? "reproduced"
                        : "NOT reproduced: " + o.reason(), o.check().source()});
            }
            return null;
        }

        @Override
        protected void process(List<Object[]> rows) {
            for (Object[] r : rows) {
                shown.add(java.util.Arrays.stream(r).map(String::valueOf).toList());
            }
            table.show(new org.eddycast.report.SummaryContent.Table(HEADER, shown));
            bar.setValue(getProgress() * 10);
        }

        @Override
        protected void done() {
            bar.setValue(1000);
            String outcome = cancel.isCancelled() ? "Stopped" : "All " + cases.size() + " cases run";
            try {
                get();
            } catch (java.util.concurrent.ExecutionException e) {
                ErrorLog.append("self-check failed", e.getCause());
                outcome = "Stopped by a fault: " + e.getCause().getMessage() + " (see " + ErrorLog.file() + ")";
            } catch (InterruptedException | java.util.concurrent.CancellationException e) {
                outcome = "Stopped";
            }
            bar.setString(outcome);
        }
    }
}
