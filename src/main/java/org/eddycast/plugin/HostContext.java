package org.eddycast.plugin;

import java.awt.Component;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javax.swing.Action;

/**
 * The narrow set of services a host offers a tool. The host owns the frame, its menus and its status line; a
 * tool asks through these methods and never reaches into the host's components. Every method is called on the
 * event thread.
 */
public interface HostContext {

    /** Shows a short message in the host's status line. */
    void showStatus(String text);

    /** Tells the host the name of the open document and whether it has unsaved changes (for its title). */
    void documentChanged(String documentName, boolean modified);

    /**
     * Asks the user for a file to open.
     *
     * @param title     the dialog's title
     * @param extension the file-name extension without the dot, for example "json"
     * @return the chosen file, or empty when the user cancelled
     */
    Optional<Path> chooseFileToOpen(String title, String extension);

    /**
     * Asks the user for a file to open, the dialog starting in a given folder.
     *
     * @param startFolder the folder the dialog opens in, or null for the host's choice
     */
    default Optional<Path> chooseFileToOpen(String title, String extension, Path startFolder) {
        return chooseFileToOpen(title, extension);
    }

    /**
     * The value an action carries under this key, a {@code java.util.function.Supplier<List<Action>>}, makes
     * the host show the action as a submenu whose entries are asked for each time it opens (an "open recent"
     * list, for example). An empty list shows the submenu disabled.
     */
    String SUBMENU_ITEMS = "org.eddycast.plugin.submenuItems";

    /**
     * Asks the user for a file to save to.
     *
     * @param title     the dialog's title
     * @param extension the file-name extension without the dot
     * @param suggested a suggested file, or null
     * @return the chosen file, or empty when the user cancelled
     */
    Optional<Path> chooseFileToSave(String title, String extension, Path suggested);

    /**
     * Adds a menu of the tool's actions to the host's menu bar. Actions carry their own name, mnemonic and
     * accelerator; a null entry is a separator. The host decides where the menu goes.
     *
     * @param title    the menu's title, with the mnemonic letter marked by a preceding '&amp;'
     * @param actions  the actions in order
     */
    void contributeMenu(String title, List<Action> actions);

    /** The component dialogs should be centred on. */
    Component dialogParent();
}
