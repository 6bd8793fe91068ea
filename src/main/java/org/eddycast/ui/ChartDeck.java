package org.eddycast.ui;

import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.report.ChartSpec;
import org.jfree.chart.ChartPanel;

/**
 * Several charts in one place: a chooser above names each chart by what it shows, and one chart fills the
 * space below. A chart not available yet shows a line saying when it will be.
 */
final class ChartDeck extends JPanel {

    private final JComboBox<String> chooser = new JComboBox<>();
    private final JPanel holder = new JPanel(new BorderLayout());
    private final Map<String, ChartSpec> specs = new LinkedHashMap<>();
    private final Map<String, String> waiting = new LinkedHashMap<>();

    /**
     * @param name    the component name (for tests)
     * @param entries each chart's name in the chooser and the line shown until it is available
     */
    ChartDeck(String name, Map<String, String> entries) {
        super(new BorderLayout());
        setName(name);
        chooser.setName(name + ".chooser");
        for (Map.Entry<String, String> e : entries.entrySet()) {
            chooser.addItem(e.getKey());
            specs.put(e.getKey(), null);
            waiting.put(e.getKey(), e.getValue());
        }
        chooser.addActionListener(e -> showSelected());
        JPanel top = new JPanel(new MigLayout("insets 4 8 0 8", "[][grow]"));
        JLabel show = new JLabel("Show:");
        show.setLabelFor(chooser);
        show.setDisplayedMnemonic('W');
        top.add(show);
        top.add(chooser);
        add(top, BorderLayout.NORTH);
        add(holder, BorderLayout.CENTER);
        showSelected();
    }

    /** Sets one chart (null: not available yet, or with {@code why} the reason it is absent). */
    void set(String entry, ChartSpec spec, String why) {
        specs.put(entry, spec);
        if (why != null) {
            waiting.put(entry, why);
        }
        if (entry.equals(chooser.getSelectedItem())) {
            showSelected();
        }
    }

    /** Chooses the chart shown. */
    void select(String entry) {
        chooser.setSelectedItem(entry);
    }

    String selected() {
        return (String) chooser.getSelectedItem();
    }

    /** The charts available now, in the chooser's order. */
    List<ChartSpec> charts() {
        List<ChartSpec> list = new ArrayList<>();
        specs.values().stream().filter(s -> s != null).forEach(list::add);
        return list;
    }

    @Override
    public void updateUI() {
        super.updateUI();
        // called by the look and feel before the fields exist, and again on every change of theme
        if (holder != null) {
            restyle();
        }
    }

    /** Draws every chart again in the current theme's colours. */
    void restyle() {
        holder.removeAll();
        showSelected();
    }

    private void showSelected() {
        String entry = (String) chooser.getSelectedItem();
        ChartSpec spec = entry == null ? null : specs.get(entry);
        if (spec != null && holder.getComponentCount() == 1 && holder.getComponent(0) instanceof ChartPanel cp) {
            ThemeCharts.restyle(cp, spec);
        } else {
            holder.removeAll();
            if (spec == null) {
                JLabel l = new JLabel(entry == null ? "" : waiting.get(entry), JLabel.CENTER);
                l.setName(getName() + ".waiting");
                holder.add(l, BorderLayout.CENTER);
            } else {
                holder.add(ThemeCharts.panel(spec), BorderLayout.CENTER);
            }
        }
        holder.revalidate();
        holder.repaint();
    }
}
