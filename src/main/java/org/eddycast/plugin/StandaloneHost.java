package org.eddycast.plugin;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.net.URL;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.ImageIcon;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;
import javax.swing.filechooser.FileNameExtensionFilter;

/**
 * A small host that runs one tool in a window of its own: it finds tools through {@link ServiceLoader}, records
 * and skips any that fail to load, owns the frame, the menu bar (File, then the tool's menus, then View) and the
 * status line, and asks the tool before it closes.
 */
public final class StandaloneHost implements HostContext {

    /** A tool that could not be loaded, and why. */
    public record LoadFailure(String what, String reason) {
    }

    /** The tools found and the ones that failed. */
    public record Discovery(List<ToolPlugin> tools, List<LoadFailure> failures) {
        public Discovery {
            tools = List.copyOf(tools);
            failures = List.copyOf(failures);
        }
    }

    private final JFrame frame = new JFrame();
    private final JMenuBar menus = new JMenuBar();
    private final JLabel status = new JLabel(" ");
    private final JMenu fileMenu = new JMenu("File");
    private final List<JMenu> toolMenus = new ArrayList<>();
    private final PluginInfo info;
    private ToolPanel panel;

    private StandaloneHost(ToolPlugin tool) {
        this.info = tool.info();
        frame.setTitle(info.name());
        URL icon = tool.getClass().getClassLoader().getResource(info.iconResource());
        if (icon != null) {
            frame.setIconImage(new ImageIcon(icon).getImage());
        }
        fileMenu.setMnemonic(KeyEvent.VK_F);
        menus.add(fileMenu);
        frame.setJMenuBar(menus);
        status.setBorder(BorderFactory.createEmptyBorder(3, 8, 3, 8));
        frame.getContentPane().add(status, BorderLayout.SOUTH);
        panel = tool.createPanel(this);
        frame.getContentPane().add(panel.component(), BorderLayout.CENTER);
        fileMenu.addSeparator();
        JMenuItem exit = fileMenu.add(new AbstractAction("Exit") {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                closeIfAllowed();
            }
        });
        exit.setMnemonic(KeyEvent.VK_X);
        menus.add(viewMenu());
        keepHelpLast();
        frame.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                closeIfAllowed();
            }
        });
    }

    /** Finds every tool on the class path; a tool that fails to load is recorded and skipped. */
    public static Discovery discover(ClassLoader loader) {
        List<ToolPlugin> tools = new ArrayList<>();
        List<LoadFailure> failures = new ArrayList<>();
        var it = ServiceLoader.load(ToolPlugin.class, loader).stream().iterator();
        while (true) {
            ServiceLoader.Provider<ToolPlugin> provider;
            try {
                if (!it.hasNext()) {
                    break;
                }
                provider = it.next();
            } catch (ServiceConfigurationError e) {
                failures.add(new LoadFailure("(service list)", e.getMessage()));
                continue;
            }
            try {
                ToolPlugin t = provider.get();
                t.info();
                tools.add(t);
            } catch (RuntimeException | ServiceConfigurationError | LinkageError e) {
                failures.add(new LoadFailure(provider.type().getName(), String.valueOf(e)));
            }
        }
        return new Discovery(tools, failures);
    }

    /**
     * Opens the tool with the given id in its own window. Sets the look and feel, then builds everything on the
     * event thread.
     */
    public static void open(String toolId, boolean dark) {
        System.setProperty("flatlaf.uiScale.allowScaleDown", "true");
        SwingUtilities.invokeLater(() -> {
            if (dark) {
                FlatDarkLaf.setup();
            } else {
                FlatLightLaf.setup();
            }
            Discovery d = discover(StandaloneHost.class.getClassLoader());
            for (LoadFailure f : d.failures()) {
                System.err.println("eddycast: skipped a tool that failed to load: " + f.what() + ": " + f.reason());
            }
            ToolPlugin tool = d.tools().stream().filter(t -> t.info().id().equals(toolId)).findFirst()
                    .orElseThrow(() -> new IllegalStateException("no tool with id " + toolId + " on the class path"));
            StandaloneHost host = new StandaloneHost(tool);
            host.frame.pack();
            // never larger than the screen's usable area: on a 1024 x 700 screen the window fits and scrolls
            java.awt.Rectangle screen = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment()
                    .getMaximumWindowBounds();
            host.frame.setSize(Math.min(host.frame.getWidth(), screen.width),
                    Math.min(host.frame.getHeight(), screen.height));
            host.frame.setLocationRelativeTo(null);
            host.frame.setVisible(true);
        });
    }

    /** By convention the Help menu stands last, whatever order the tool contributed its menus in. */
    private void keepHelpLast() {
        for (int i = 0; i < menus.getMenuCount(); i++) {
            JMenu m = menus.getMenu(i);
            if (m != null && "Help".equals(m.getText())) {
                menus.remove(m);
                menus.add(m);
                return;
            }
        }
    }

    private JMenu viewMenu() {
        JMenu view = new JMenu("View");
        view.setMnemonic(KeyEvent.VK_V);
        JMenuItem light = view.add(new AbstractAction("Light theme") {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                switchTheme(false);
            }
        });
        light.setMnemonic(KeyEvent.VK_L);
        JMenuItem dark = view.add(new AbstractAction("Dark theme") {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                switchTheme(true);
            }
        });
        dark.setMnemonic(KeyEvent.VK_D);
        return view;
    }

    private void switchTheme(boolean dark) {
        if (dark) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
        com.formdev.flatlaf.FlatLaf.updateUI();
    }

    /**
     * Closes the tool when it agrees: every window of the process (the self-check and any other dialog
     * included) is closed and the process ends, since this host owns it.
     */
    private void closeIfAllowed() {
        if (panel != null && panel.confirmClose()) {
            panel.dispose();
            panel = null;
            for (java.awt.Window w : java.awt.Window.getWindows()) {
                w.dispose();
            }
            System.exit(0);
        }
    }

    @Override
    public void showStatus(String text) {
        status.setText(text == null || text.isEmpty() ? " " : text);
    }

    @Override
    public void documentChanged(String documentName, boolean modified) {
        frame.setTitle((modified ? "* " : "") + documentName + " - " + info.name());
    }

    @Override
    public Optional<Path> chooseFileToOpen(String title, String extension) {
        return chooseFileToOpen(title, extension, null);
    }

    @Override
    public Optional<Path> chooseFileToOpen(String title, String extension, Path startFolder) {
        JFileChooser chooser = chooser(title, extension, null);
        if (startFolder != null) {
            chooser.setCurrentDirectory(startFolder.toFile());
        }
        if (chooser.showOpenDialog(frame) != JFileChooser.APPROVE_OPTION) {
            return Optional.empty();
        }
        return Optional.of(chooser.getSelectedFile().toPath());
    }

    @Override
    public Optional<Path> chooseFileToSave(String title, String extension, Path suggested) {
        JFileChooser chooser = chooser(title, extension, suggested);
        if (chooser.showSaveDialog(frame) != JFileChooser.APPROVE_OPTION) {
            return Optional.empty();
        }
        Path p = chooser.getSelectedFile().toPath();
        if (!p.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith("." + extension)) {
            p = p.resolveSibling(p.getFileName() + "." + extension);
        }
        return Optional.of(p);
    }

    private static JFileChooser chooser(String title, String extension, Path suggested) {
        JFileChooser chooser = new JFileChooser();
        chooser.setDialogTitle(title);
        chooser.setFileFilter(new FileNameExtensionFilter(extension.toUpperCase(java.util.Locale.ROOT) + " files",
                extension));
        if (suggested != null) {
            chooser.setSelectedFile(suggested.toFile());
        }
        return chooser;
    }

    @Override
    public void contributeMenu(String title, List<Action> actions) {
        int amp = title.indexOf('&');
        JMenu menu;
        if (title.replace("&", "").equals("File")) {
            menu = fileMenu;
        } else {
            menu = new JMenu(title.replace("&", ""));
            if (amp >= 0 && amp + 1 < title.length()) {
                menu.setMnemonic(Character.toUpperCase(title.charAt(amp + 1)));
            }
            toolMenus.add(menu);
            menus.add(menu);
        }
        for (Action a : actions) {
            if (a == null) {
                menu.addSeparator();
            } else if (a.getValue(SUBMENU_ITEMS) instanceof java.util.function.Supplier<?> items) {
                menu.add(submenu(a, items));
            } else {
                menu.add(a);
            }
        }
    }

    /** A submenu filled from the supplier each time it opens. */
    private static JMenu submenu(Action a, java.util.function.Supplier<?> items) {
        JMenu sub = new JMenu(a);
        sub.addMenuListener(new javax.swing.event.MenuListener() {
            @Override
            public void menuSelected(javax.swing.event.MenuEvent e) {
                sub.removeAll();
                if (items.get() instanceof List<?> list) {
                    for (Object o : list) {
                        if (o instanceof Action item) {
                            sub.add(item);
                        }
                    }
                }
                if (sub.getItemCount() == 0) {
                    JMenuItem none = new JMenuItem("(none yet)");
                    none.setEnabled(false);
                    sub.add(none);
                }
            }

            @Override
            public void menuDeselected(javax.swing.event.MenuEvent e) {
            }

            @Override
            public void menuCanceled(javax.swing.event.MenuEvent e) {
            }
        });
        return sub;
    }

    @Override
    public Component dialogParent() {
        return frame;
    }
}
