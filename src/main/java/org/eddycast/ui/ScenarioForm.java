package org.eddycast.ui;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.awt.Component;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.Timer;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import net.miginfocom.swing.MigLayout;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;

/**
 * The scenario input form: sections of fields, each with its unit, a tooltip and an inline check. The form's
 * values are written into a copy of the loaded scenario's JSON tree (so settings the form does not show are
 * kept) and validated by {@link ScenarioReader}, whose messages name the field; each message is shown under
 * the field it names.
 */
public final class ScenarioForm extends JPanel {

    /** The form's state after a check. */
    public record Check(Scenario scenario, Map<String, String> fieldProblems, List<String> otherProblems) {
        public Check {
            fieldProblems = Map.copyOf(fieldProblems);
            otherProblems = List.copyOf(otherProblems);
        }

        public boolean valid() {
            return scenario != null;
        }
    }

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final String EDITABLE_WHILE_RUNNING = "name forecast.";

    private final List<FieldRow> rows = new ArrayList<>();
    private final JComboBox<String> route = new JComboBox<>(FormLayout.ROUTES.toArray(String[]::new));
    private final WrappingText otherProblems = new WrappingText("problems");
    private final Timer recheck;
    private final List<Runnable> changeListeners = new ArrayList<>();
    private ObjectNode base = MAPPER.createObjectNode();
    private Path folder = Path.of("").toAbsolutePath();
    private Check last = new Check(null, Map.of(), List.of());
    private boolean loading;

    public ScenarioForm() {
        // labels and units keep their width; the fields give way down to 80 pixels when the window is narrow
        super(new MigLayout("insets dialog, wrap 3, hidemode 3, gapy 2", "[right,pref!][grow,fill,sizegroup v,80:pref][left,pref!]"));
        recheck = new Timer(200, e -> check());
        recheck.setRepeats(false);
        JLabel routeLabel = new JLabel(FormText.plain("route.label"));
        routeLabel.setDisplayedMnemonic(FormText.mnemonic("route.label"));
        routeLabel.setLabelFor(route);
        route.setName("route");
        route.setToolTipText(FormText.get("route.tip"));
        route.setRenderer(new javax.swing.DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(javax.swing.JList<?> list, Object value, int index,
                                                          boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, FormText.get("route." + value), index, selected,
                        focus);
            }
        });
        route.addActionListener(e -> routeChanged());
        for (FormLayout.Section section : FormLayout.SECTIONS) {
            JLabel title = new JLabel(FormText.get(section.key()));
            title.putClientProperty("FlatLaf.styleClass", "h4");
            add(title, "span, left, gaptop para, gapbottom 2");
            if (section.key().equals("section.flow")) {
                add(routeLabel);
                add(route, "span 2, wmin 60, wrap");
            }
            for (FieldSpec spec : section.fields()) {
                FieldRow row = new FieldRow(spec);
                rows.add(row);
                row.addTo(this);
            }
        }
        otherProblems.putClientProperty("FlatLaf.styleClass", "small");
        otherProblems.setForeground(ThemeColours.problemText());
        add(otherProblems, "span, growx, wmin 10, gaptop para");
        routeChanged();
    }

    /** Asks for a file given the folder to start in; the panel sets it to the host's file dialog. */
    public interface FileChooser {
        java.util.Optional<Path> choose(Path startFolder);
    }

    private FileChooser recordChooser = start -> java.util.Optional.empty();

    /** Sets how the record field's Browse button asks for a file. */
    public void setRecordChooser(FileChooser chooser) {
        recordChooser = chooser;
    }

    private void browseFor(FieldRow row) {
        recordChooser.choose(folder).ifPresent(p -> {
            Path abs = p.toAbsolutePath().normalize();
            Path f = folder.toAbsolutePath().normalize();
            // relative to the scenario's folder when it lies under it, so the scenario can move with its record
            row.setText(abs.startsWith(f) ? f.relativize(abs).toString().replace('\\', '/') : abs.toString());
            check();
        });
    }

    /** Runs after every change the user makes, once the form has been checked again. */
    public void addChangeListener(Runnable r) {
        changeListeners.add(r);
    }

    /** Fills the form from a scenario; fields the form does not show are kept as they are. */
    public void load(Scenario s, Path scenarioFolder) {
        ObjectNode tree = ScenarioWriter.tree(s);
        if (s.flow() instanceof org.eddycast.scenario.MeasuredFlow m) {
            // the writer keeps the path as written; show it as written
            ((ObjectNode) tree.path("flow")).put("record", m.record());
        }
        loadTree(tree, scenarioFolder);
    }

    /**
     * Fills the form from a scenario file's text even when some values are not valid, so a file with a bad
     * value opens with that field marked instead of being refused. Text that is not JSON at all is refused with
     * its line and column.
     *
     * @throws ScenarioException when the text is not a JSON object
     */
    public void loadText(String json, Path scenarioFolder) {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            // the reader words the syntax error with its line and column
            ScenarioReader.parse(json, scenarioFolder);
            throw new ScenarioException("not valid JSON (" + e.getOriginalMessage() + ")");
        }
        if (!(root instanceof ObjectNode tree) || !(tree.path("flow") instanceof ObjectNode)) {
            ScenarioReader.parse(json, scenarioFolder);
            throw new ScenarioException("a scenario must be a JSON object with a \"flow\" object");
        }
        loadTree(tree, scenarioFolder);
    }

    private void loadTree(ObjectNode tree, Path scenarioFolder) {
        loading = true;
        try {
            base = tree;
            folder = scenarioFolder == null ? Path.of("").toAbsolutePath() : scenarioFolder;
            JsonNode flow = base.path("flow");
            String kind = flow.path("kind").asText();
            if (FormLayout.ROUTES.contains(kind)) {
                route.setSelectedItem(kind);
            }
            for (FieldRow row : rows) {
                if (row.spec.route() == null || row.spec.route().equals(kind)) {
                    row.setFrom(node(base, row.spec.path()));
                } else {
                    row.clearIfEmpty();
                }
            }
            if (!base.path("release").has("location")) {
                rowFor("release.location").setText(base.path("release").path("atBank").asBoolean() ? "bank"
                        : "centre-line");
            }
        } finally {
            loading = false;
        }
        routeChanged();
        check();
    }

    /** The folder relative record paths are resolved against. */
    public Path folder() {
        return folder;
    }

    /** Sets the folder relative record paths are resolved against (after a save under a new name). */
    public void setFolder(Path f) {
        folder = f;
        check();
    }

    /** Checks the form now and returns the outcome; marks each field that has a problem. */
    public Check check() {
        recheck.stop();
        Map<String, String> fieldProblems = new LinkedHashMap<>();
        List<String> other = new ArrayList<>();
        ObjectNode tree = build(fieldProblems);
        Scenario scenario = null;
        // the file's own checks run even when a field could not be read, so every problem shows at once
        try {
            Scenario parsed = ScenarioReader.parse(tree.toString(), folder);
            scenario = fieldProblems.isEmpty() ? parsed : null;
        } catch (ScenarioException e) {
            for (String p : e.problems()) {
                FieldRow row = rowNamedIn(p);
                if (row == null) {
                    other.add(inFormWords(p));
                } else if (!fieldProblems.containsKey(row.spec.path())) {
                    fieldProblems.put(row.spec.path(), inFormWords(p));
                }
                // else: the field could not be read at all, and that message says more
            }
        } catch (IllegalArgumentException e) {
            other.add(inFormWords(String.valueOf(e.getMessage())));
        }
        for (FieldRow row : rows) {
            row.showProblem(row.visible() ? fieldProblems.get(row.spec.path()) : null);
        }
        otherProblems.setText(String.join("\n", other));
        otherProblems.setForeground(ThemeColours.problemText());
        otherProblems.setVisible(!other.isEmpty());
        last = new Check(scenario, fieldProblems, other);
        revalidate();
        return last;
    }

    /** The outcome of the latest check. */
    public Check lastCheck() {
        return last;
    }

    /** Every field's problem as shown under it, by field path (for tests). */
    public Map<String, String> shownProblems() {
        Map<String, String> shown = new LinkedHashMap<>();
        for (FieldRow row : rows) {
            if (row.problem.isVisible()) {
                shown.put(row.spec.path(), row.problem.getText());
            }
        }
        return shown;
    }

    /** Locks the inputs that define a running simulation; name and forecast settings stay editable. */
    public void setRunning(boolean running) {
        route.setEnabled(!running);
        for (FieldRow row : rows) {
            boolean stays = row.spec.path().equals("name") || row.spec.path().startsWith("forecast.");
            row.setEditable(!running || stays);
        }
    }

    /** The text of a field (for tests and the summary), "" when empty. */
    public String value(String path) {
        return rowFor(path).text();
    }

    /** Sets a field as the user would, then checks the form. */
    public void setValue(String path, String text) {
        FieldRow row = rowFor(path);
        row.setText(text);
        check();
    }

    /** Chooses a flow route as the user would. */
    public void setRoute(String kind) {
        route.setSelectedItem(kind);
    }

    /** The selected flow route. */
    public String route() {
        return (String) route.getSelectedItem();
    }

    /** The component that edits a field (for focus and tests). */
    public JComponent editor(String path) {
        return rowFor(path).editor;
    }

    private FieldRow rowFor(String path) {
        String r = route();
        FieldRow fallback = null;
        for (FieldRow row : rows) {
            if (row.spec.path().equals(path)) {
                if (row.spec.route() == null || row.spec.route().equals(r)) {
                    return row;
                }
                fallback = row;
            }
        }
        if (fallback == null) {
            throw new IllegalArgumentException("the form has no field " + path);
        }
        return fallback;
    }

    /**
     * A reader message in the form's words: each field path or key it names ("flow.depth", "tankDiameter")
     * becomes the field's label on the form ("Depth h", "Tank diameter T").
     */
    String inFormWords(String message) {
        String out = message;
        List<FieldRow> byLength = new ArrayList<>(rows);
        byLength.sort((a, b) -> b.spec.path().length() - a.spec.path().length());
        for (FieldRow row : byLength) {
            if (!row.visible()) {
                continue;
            }
            String label = "\u201c" + row.label.getText() + "\u201d";
            for (String name : List.of(row.spec.path(), route() + "." + row.spec.key(), row.spec.key())) {
                // plain words ("name", "depth") stay words; paths and camel-case keys are field names
                if (name.contains(".") || !name.equals(name.toLowerCase(Locale.ROOT))) {
                    out = replaceName(out, name, label);
                }
            }
        }
        return Character.toUpperCase(out.charAt(0)) + out.substring(1);
    }

    private static String replaceName(String text, String name, String label) {
        StringBuilder sb = new StringBuilder();
        int from = 0;
        int i = text.indexOf(name);
        while (i >= 0) {
            int end = i + name.length();
            if (standsAlone(text, i, end)) {
                sb.append(text, from, i).append(label);
                from = end;
            }
            i = text.indexOf(name, end);
        }
        return sb.append(text.substring(from)).toString();
    }

    /** The visible field a reader message names: the longest path it contains (design checks say "tank."). */
    private FieldRow rowNamedIn(String problem) {
        FieldRow best = null;
        for (FieldRow row : rows) {
            if (!row.visible()) {
                continue;
            }
            String p = row.spec.path();
            List<String> names = new ArrayList<>(List.of(p));
            if (p.startsWith("flow.")) {
                names.add(route() + "." + row.spec.key());
            }
            for (String n : names) {
                if (mentions(problem, n) && (best == null || p.length() > best.spec.path().length())) {
                    best = row;
                }
            }
        }
        return best;
    }

    /** Whether text[start, end) is a whole name: not part of a longer word or of a dotted path. */
    private static boolean standsAlone(String text, int start, int end) {
        boolean startOk = start == 0 || !Character.isLetterOrDigit(text.charAt(start - 1))
                && text.charAt(start - 1) != '.';
        boolean endOk = end == text.length() || !Character.isLetterOrDigit(text.charAt(end))
                && text.charAt(end) != '.';
        return startOk && endOk;
    }

    private static boolean mentions(String text, String name) {
        int i = text.indexOf(name);
        while (i >= 0) {
            if (standsAlone(text, i, i + name.length())) {
                return true;
            }
            i = text.indexOf(name, i + 1);
        }
        return false;
    }

    private ObjectNode build(Map<String, String> problems) {
        ObjectNode tree = base.deepCopy();
        String kind = route();
        if (!kind.equals(tree.path("flow").path("kind").asText())) {
            tree.putObject("flow");
        }
        ObjectNode flow = (ObjectNode) tree.get("flow");
        flow.put("kind", kind);
        if (tree.get("release") instanceof ObjectNode release) {
            // the reader refuses a release field of another route: it goes with the route it belonged to
            if (!kind.equals("channel")) {
                release.remove(List.of("location", "rate", "duration"));
            }
            if (!kind.equals("tank")) {
                release.remove("position");
            }
        }
        if (!kind.equals("channel") && tree.get("forecast") instanceof ObjectNode forecast) {
            forecast.remove("horizonDistance");
        }
        for (FieldRow row : rows) {
            if (!row.visible()) {
                continue;
            }
            ObjectNode parent = parentOf(tree, row.spec.parent());
            String text = row.text().trim();
            parent.remove(row.spec.key());
            if (text.isEmpty()) {
                if (!row.spec.optional() && row.spec.kind() != FieldSpec.Kind.TEXT) {
                    problems.put(row.spec.path(), "\u201c" + row.label.getText() + "\u201d is empty: enter a value"
                            + (row.spec.unit().isEmpty() ? "" : " in " + row.spec.unit()));
                }
                continue;
            }
            switch (row.spec.kind()) {
                case NUMBER -> {
                    Double v = parseNumber(text);
                    if (v == null) {
                        problems.put(row.spec.path(), "\u201c" + row.label.getText() + "\u201d: \"" + text
                                + "\" is not a number; write"
                                + " it like 0.25 or 4e-10" + (row.spec.unit().isEmpty() ? "" : " (in "
                                + row.spec.unit() + ")"));
                    } else {
                        parent.put(row.spec.key(), v);
                    }
                }
                case INTEGER -> {
                    try {
                        parent.put(row.spec.key(), Long.parseLong(text));
                    } catch (NumberFormatException e) {
                        problems.put(row.spec.path(), "\u201c" + row.label.getText() + "\u201d: \"" + text
                                + "\" is not a whole number");
                    }
                }
                case FLAG -> parent.put(row.spec.key(), Boolean.parseBoolean(text));
                case RANGES -> {
                    RangeLines.Parsed parsed = RangeLines.parse(text);
                    if (!parsed.problems().isEmpty()) {
                        problems.put(row.spec.path(), String.join("; ", parsed.problems()));
                    } else if (!parsed.ranges().isEmpty()) {
                        parent.set(row.spec.key(), parsed.ranges());
                    }
                }
                default -> parent.put(row.spec.key(), text);
            }
        }
        if (tree.get("uncertainty") instanceof ObjectNode u && u.isEmpty()) {
            tree.remove("uncertainty");
        }
        if (tree.path("release").isObject()) {
            ((ObjectNode) tree.get("release")).remove("atBank");
        }
        return tree;
    }

    private static Double parseNumber(String text) {
        try {
            double v = Double.parseDouble(text.replace('\u2212', '-'));
            return Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    private static ObjectNode parentOf(ObjectNode root, String path) {
        ObjectNode n = root;
        if (path.isEmpty()) {
            return n;
        }
        for (String part : path.split("\\.")) {
            JsonNode child = n.get(part);
            if (!(child instanceof ObjectNode)) {
                child = n.putObject(part);
            }
            n = (ObjectNode) child;
        }
        return n;
    }

    private static JsonNode node(JsonNode root, String path) {
        JsonNode n = root;
        for (String part : path.split("\\.")) {
            n = n == null ? null : n.get(part);
        }
        return n;
    }

    private void routeChanged() {
        String kind = route();
        for (FieldRow row : rows) {
            row.setVisible(row.spec.route() == null || row.spec.route().equals(kind));
        }
        changed();
        revalidate();
        repaint();
    }

    private void changed() {
        if (loading) {
            return;
        }
        recheck.restart();
        for (Runnable r : changeListeners) {
            r.run();
        }
    }

    /** One field: label, editor, unit and its inline check. */
    private final class FieldRow {
        final FieldSpec spec;
        final JLabel label;
        final JComponent editor;
        final JLabel unit;
        final WrappingText problem = new WrappingText("problem");
        javax.swing.JButton browseButton;
        javax.swing.JScrollPane scroll;
        private boolean shown = true;

        FieldRow(FieldSpec spec) {
            this.spec = spec;
            String key = spec.path() + ".label";
            label = new JLabel(FormText.plain(key));
            String tip = FormText.get(spec.path() + ".tip");
            editor = switch (spec.kind()) {
                case CHOICE -> {
                    JComboBox<String> c = new JComboBox<>(spec.choices().toArray(String[]::new));
                    c.setRenderer(new javax.swing.DefaultListCellRenderer() {
                        @Override
                        public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> list,
                                Object value, int index, boolean selected, boolean focus) {
                            return super.getListCellRendererComponent(list, choiceWords(value), index, selected,
                                    focus);
                        }
                    });
                    c.addActionListener(e -> changed());
                    yield c;
                }
                case FLAG -> {
                    JCheckBox b = new JCheckBox();
                    b.addActionListener(e -> changed());
                    yield b;
                }
                case RANGES -> {
                    javax.swing.JTextArea a = new javax.swing.JTextArea(4, 24);
                    recheckOnEdit(a);
                    a.putClientProperty("JTextArea.placeholderText", "flow.bedSlope +-25%   # why");
                    yield a;
                }
                default -> {
                    JTextField f = new JTextField(12);
                    recheckOnEdit(f);
                    if (spec.optional()) {
                        f.putClientProperty("JTextField.placeholderText", "optional");
                    }
                    yield f;
                }
            };
            editor.setName(spec.route() == null ? spec.path() : spec.route() + ":" + spec.path());
            editor.setToolTipText(tip);
            label.setToolTipText(tip);
            label.setLabelFor(editor);
            int m = FormText.mnemonic(key);
            if (m != 0) {
                label.setDisplayedMnemonic(m);
            }
            unit = new JLabel(spec.unit());
            problem.setName("problem:" + editor.getName());
            problem.putClientProperty("FlatLaf.styleClass", "small");
            problem.setForeground(ThemeColours.problemText());
            problem.setVisible(false);
        }

        void addTo(JPanel p) {
            p.add(label);
            if (spec.kind() == FieldSpec.Kind.RANGES) {
                scroll = new javax.swing.JScrollPane(editor);
                p.add(scroll, "span 2, wmin 60, hmin 70");
            } else if (spec.kind() == FieldSpec.Kind.CHOICE) {
                // a chooser has no unit: it takes the unit's column too, so its longest choice shows in full
                p.add(editor, "span 2, wmin 60");
            } else if (spec.kind() == FieldSpec.Kind.TEXT && spec.path().equals("flow.record")) {
                p.add(editor, "wmin 60");
                javax.swing.JButton browse = new javax.swing.JButton("Browse\u2026");
                browse.setName("browse:" + spec.path());
                browse.setMnemonic('B');
                browse.setToolTipText("Choose the velocity record file (CSV)");
                browse.addActionListener(e -> browseFor(this));
                p.add(browse);
                browseButton = browse;
            } else {
                p.add(editor, "wmin 60");
                p.add(unit, "wmin 40");
            }
            p.add(problem, "skip, span 2, growx, wmin 10, gapbottom 3");
        }

        boolean visible() {
            return shown;
        }

        void setVisible(boolean v) {
            shown = v;
            label.setVisible(v);
            editor.setVisible(v);
            unit.setVisible(v);
            if (browseButton != null) {
                browseButton.setVisible(v);
            }
            if (scroll != null) {
                scroll.setVisible(v);
            }
            if (!v) {
                problem.setVisible(false);
            }
        }

        void showProblem(String text) {
            problem.setText(text == null ? "" : text);
            // the colour of the theme in force now (the theme may have been switched since)
            problem.setForeground(ThemeColours.problemText());
            problem.setToolTipText(text);
            problem.setVisible(text != null && shown);
            editor.putClientProperty("JComponent.outline", text == null ? null : "error");
        }

        void setEditable(boolean e) {
            if (editor instanceof javax.swing.text.JTextComponent f) {
                f.setEditable(e);
            } else {
                editor.setEnabled(e);
            }
        }

        String text() {
            if (editor instanceof javax.swing.text.JTextComponent f) {
                return f.getText();
            }
            if (editor instanceof JCheckBox b) {
                return String.valueOf(b.isSelected());
            }
            Object v = ((JComboBox<?>) editor).getSelectedItem();
            return v == null ? "" : v.toString();
        }

        void setText(String t) {
            if (editor instanceof javax.swing.text.JTextComponent f) {
                f.setText(t);
                // a long value shows its beginning, not its end
                f.setCaretPosition(0);
            } else if (editor instanceof JCheckBox b) {
                b.setSelected(Boolean.parseBoolean(t));
            } else {
                ((JComboBox<?>) editor).setSelectedItem(t);
            }
        }

        void setFrom(JsonNode v) {
            if (v == null || v.isNull() || v.isMissingNode()) {
                if (spec.kind() == FieldSpec.Kind.FLAG) {
                    setText("true");
                } else if (spec.kind() != FieldSpec.Kind.CHOICE) {
                    setText("");
                }
                return;
            }
            if (spec.kind() == FieldSpec.Kind.RANGES) {
                setText(RangeLines.format(v));
            } else if (v.isNumber() && spec.kind() == FieldSpec.Kind.NUMBER) {
                setText(shortNumber(v.asDouble()));
            } else {
                setText(v.asText());
            }
        }

        void clearIfEmpty() {
            // fields of other routes keep what the user typed there
        }
    }

    /** Checks the form again after every edit of a text field or area. */
    private void recheckOnEdit(javax.swing.text.JTextComponent field) {
        field.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                changed();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                changed();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                changed();
            }
        });
    }

    /** A number as a person would write it: no trailing zeros, exponent only for very small or large values. */
    static String shortNumber(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return String.valueOf((long) v);
        }
        double a = Math.abs(v);
        if (a >= 1e-3 && a < 1e7) {
            return new java.math.BigDecimal(v).round(new java.math.MathContext(10)).stripTrailingZeros()
                    .toPlainString();
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+e", "e");
    }

    /** A choice's key in words (the file keeps the key). */
    static Object choiceWords(Object key) {
        if (!(key instanceof String k)) {
            return key;
        }
        return switch (k) {
            case "fwhm" -> "full width at half maximum";
            case "standard-deviation" -> "standard deviation";
            case "visible-edge" -> "visible edge";
            default -> k;
        };
    }
}
