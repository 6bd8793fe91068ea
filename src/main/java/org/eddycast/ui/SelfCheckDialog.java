package org.eddycast.ui;

import java.awt.Component;
import java.util.List;
import java.util.Locale;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.VerificationCase;
import org.eddycast.engine.VerificationSuite;
import org.eddycast.particles.Cancellation;

/**
 * Runs the built-in verification cases in the background and shows their table, so a reviewer can see that
 * this installation reproduces the exact and published diffusivities.
 */
final class SelfCheckDialog extends JDialog {

    private final DefaultTableModel model = new DefaultTableModel(new Object[] {"case", "expected", "computed",
            "deviation (standard errors)", "outcome", "source"}, 0);
    private final JProgressBar bar = new JProgressBar(0, 1000);
    private final Cancellation cancel = new Cancellation();

    SelfCheckDialog(Component parent, int threads) {
        super(SwingUtilities.getWindowAncestor(parent), "Self-check", ModalityType.MODELESS);
        setLayout(new MigLayout("insets dialog, wrap 2, fill", "[grow,fill][]", "[grow,fill][]"));
        add(new JScrollPane(new JTable(model)), "span, w 820, h 220");
        bar.setStringPainted(true);
        add(bar);
        JButton stop = new JButton("Stop");
        stop.setMnemonic('S');
        stop.addActionListener(e -> {
            cancel.cancel();
            bar.setString("Stopped");
        });
        add(stop);
        pack();
        setLocationRelativeTo(parent);
        new Worker(threads).execute();
    }

    private final class Worker extends SwingWorker<Void, Object[]> {
        private final int threads;

        Worker(int threads) {
            this.threads = threads;
        }

        @Override
        protected Void doInBackground() {
            List<VerificationCase> cases = VerificationSuite.cases();
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
            rows.forEach(model::addRow);
            bar.setValue(getProgress() * 10);
        }

        @Override
        protected void done() {
            bar.setValue(1000);
            bar.setString(cancel.isCancelled() ? "Stopped" : "All cases run");
        }
    }
}
