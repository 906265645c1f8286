package org.mobident.viewer;

import java.awt.Component;
import java.awt.Dimension;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.mobident.io.SafeFiles;
import org.mobident.report.plot.PlotModel;
import org.mobident.report.plot.PngPlot;
import org.mobident.report.plot.SvgPlot;

/** Saves the plot as shown to a PNG or SVG file the user chooses, through {@link SafeFiles}. */
final class Exporter {

    /** Size used when the plot component has no usable size, px. */
    static final Dimension FALLBACK_SIZE = new Dimension(1200, 600);

    /** Smallest exported size, px (smaller plots have no room for their axes). */
    static final Dimension MIN_SIZE = new Dimension(400, 240);

    enum Format {
        PNG("png", "PNG image"),
        SVG("svg", "SVG drawing");

        final String extension;
        final String description;

        Format(String extension, String description) {
            this.extension = extension;
            this.description = description;
        }
    }

    private Exporter() {
    }

    /**
     * The file the save dialog proposes: the suggested name in the folder the viewer was started
     * from (where the command's other outputs go), not the home folder the dialog would open in.
     */
    static File initialFile(String suggestedName, Format format) {
        File folder = Path.of("").toAbsolutePath().toFile();
        return new File(folder, new File(withExtension(suggestedName, format)).getName());
    }

    /** Asks for a file and writes {@code model} at {@code size}; reports the outcome through {@code status}. */
    static void export(Component parent, PlotModel model, Dimension size, Format format, String suggestedName,
                       Consumer<String> status) {
        File start = initialFile(suggestedName, format);
        JFileChooser chooser = new JFileChooser(start.getParentFile());
        chooser.setDialogTitle("Save the plot as " + format.description);
        chooser.setFileFilter(new FileNameExtensionFilter(format.description + " (*." + format.extension + ")",
                format.extension));
        chooser.setSelectedFile(start);
        if (chooser.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path target = Path.of(withExtension(chooser.getSelectedFile().getPath(), format));
        boolean overwrite = false;
        if (Files.exists(target)) {
            int answer = JOptionPane.showConfirmDialog(parent,
                    target.getFileName() + " already exists in " + target.toAbsolutePath().getParent()
                            + ".\nReplace it?", "Replace file?", JOptionPane.YES_NO_OPTION,
                    JOptionPane.QUESTION_MESSAGE);
            if (answer != JOptionPane.YES_OPTION) {
                return;
            }
            overwrite = true;
        }
        Dimension d = usable(size);
        boolean replace = overwrite;
        status.accept("Saving " + target.getFileName() + "…");
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws IOException {
                write(model, d.width, d.height, format, target, replace);
                return null;
            }

            @Override
            protected void done() {
                try {
                    get();
                    status.accept("Saved " + target.toAbsolutePath());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause() == null ? e : e.getCause();
                    status.accept("Not saved: " + cause.getMessage());
                    JOptionPane.showMessageDialog(parent, "Could not save " + target + ":\n" + cause.getMessage(),
                            "Not saved", JOptionPane.ERROR_MESSAGE);
                }
            }
        }.execute();
    }

    /** Writes the plot; an existing file is replaced only with {@code overwrite}. */
    static void write(PlotModel model, int width, int height, Format format, Path target, boolean overwrite)
            throws IOException {
        if (format == Format.PNG) {
            PngPlot.write(model, width, height, target, overwrite);
        } else {
            String svg = SvgPlot.render(model, width, height);
            SafeFiles.write(target, overwrite, w -> w.write(svg));
        }
    }

    /** {@code name} ending in the format's extension (added when missing, any case accepted). */
    static String withExtension(String name, Format format) {
        String dot = "." + format.extension;
        return name.toLowerCase(Locale.ROOT).endsWith(dot) ? name : name + dot;
    }

    /** The size to export at: the component's when usable, never below {@link #MIN_SIZE}. */
    static Dimension usable(Dimension size) {
        if (size == null || size.width <= 0 || size.height <= 0) {
            return new Dimension(FALLBACK_SIZE);
        }
        return new Dimension(Math.max(size.width, MIN_SIZE.width), Math.max(size.height, MIN_SIZE.height));
    }
}
