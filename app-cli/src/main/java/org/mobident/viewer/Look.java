package org.mobident.viewer;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
import javax.swing.UIManager;

/**
 * The viewer's look: FlatLaf's light or dark theme, with a few settings of our own; the
 * platform's look when FlatLaf cannot be set up. The plot itself stays black on white in both
 * themes, as it is printed and saved.
 */
final class Look {

    private Look() {
    }

    /**
     * Installs the look for {@code theme}; call before the first component is made.
     *
     * @return false when FlatLaf could not be installed and the platform's look is used instead
     */
    static boolean install(Viewer.Theme theme) {
        boolean flat;
        try {
            flat = theme == Viewer.Theme.DARK ? FlatDarkLaf.setup() : FlatLightLaf.setup();
        } catch (RuntimeException | LinkageError e) {
            flat = false;
        }
        if (flat) {
            UIManager.put("Table.showHorizontalLines", Boolean.TRUE);
            UIManager.put("ScrollBar.showButtons", Boolean.FALSE);
            UIManager.put("SplitPane.dividerSize", 7);
            UIManager.put("TitledBorder.titleColor", UIManager.getColor("Label.disabledForeground"));
        } else {
            UIManager.put("swing.boldMetal", Boolean.FALSE);
        }
        return flat;
    }
}
