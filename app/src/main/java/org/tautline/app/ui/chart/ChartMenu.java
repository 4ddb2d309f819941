package org.tautline.app.ui.chart;

import java.awt.Component;
import java.awt.Image;
import java.awt.Point;
import java.awt.Toolkit;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.Transferable;
import java.awt.datatransfer.UnsupportedFlavorException;
import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.ExecutionException;

import javax.imageio.ImageIO;
import javax.swing.JFileChooser;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPopupMenu;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.jfree.chart.ChartPanel;

/**
 * Our context menu of a chart, in place of the chart library's: show the whole range, zoom out, save the plot as a
 * picture or copy it. The picture is drawn on the event thread (the chart is not thread-safe) and written to disk off
 * it.
 */
final class ChartMenu {
    private ChartMenu() {
    }

    static JPopupMenu of(ChartView view) {
        ChartPanel panel = view.chartPanel();
        JPopupMenu menu = new JPopupMenu();
        menu.setName("chartMenu");
        Point[] at = {new Point()};
        menu.addPopupMenuListener(new javax.swing.event.PopupMenuListener() {
            @Override
            public void popupMenuWillBecomeVisible(javax.swing.event.PopupMenuEvent e) {
                Point p = panel.getMousePosition();
                at[0] = p == null ? new Point(panel.getWidth() / 2, panel.getHeight() / 2) : p;
            }

            @Override
            public void popupMenuWillBecomeInvisible(javax.swing.event.PopupMenuEvent e) {
                // nothing to undo
            }

            @Override
            public void popupMenuCanceled(javax.swing.event.PopupMenuEvent e) {
                // nothing to undo
            }
        });
        menu.add(item("Show whole range", e -> view.showWholeRange()));
        menu.add(item("Zoom out here", e -> panel.zoomOutBoth(at[0].getX(), at[0].getY())));
        menu.addSeparator();
        menu.add(item("Save plot as picture (PNG)...", e -> save(panel)));
        menu.add(item("Copy plot as picture", e -> copy(panel)));
        return menu;
    }

    private static JMenuItem item(String text, java.awt.event.ActionListener action) {
        JMenuItem item = new JMenuItem(text);
        item.addActionListener(action);
        return item;
    }

    private static BufferedImage picture(ChartPanel panel) {
        return panel.getChart().createBufferedImage(Math.max(400, panel.getWidth()), Math.max(300, panel.getHeight()));
    }

    private static void save(ChartPanel panel) {
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("PNG picture", "png"));
        chooser.setSelectedFile(new File("plot.png"));
        if (chooser.showSaveDialog(panel) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path chosen = chooser.getSelectedFile().toPath();
        Path file = chosen.getFileName().toString().contains(".") ? chosen
                : chosen.resolveSibling(chosen.getFileName() + ".png");
        BufferedImage image = picture(panel);
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws IOException {
                if (!ImageIO.write(image, "png", file.toFile())) {
                    throw new IOException("no PNG writer is available");
                }
                return null;
            }

            @Override
            protected void done() {
                try {
                    get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    complain(panel, "Could not save the plot to " + file + ": " + e.getCause().getMessage());
                }
            }
        }.execute();
    }

    private static void copy(ChartPanel panel) {
        BufferedImage image = picture(panel);
        try {
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new Picture(image), null);
        } catch (IllegalStateException e) {
            complain(panel, "Could not copy the plot: the clipboard is busy; try again.");
        }
    }

    private static void complain(Component parent, String message) {
        JOptionPane.showMessageDialog(SwingUtilities.getWindowAncestor(parent), message, "Tautline",
                JOptionPane.ERROR_MESSAGE);
    }

    /** A picture on the clipboard. */
    private record Picture(Image image) implements Transferable {
        @Override
        public DataFlavor[] getTransferDataFlavors() {
            return new DataFlavor[] {DataFlavor.imageFlavor};
        }

        @Override
        public boolean isDataFlavorSupported(DataFlavor flavor) {
            return DataFlavor.imageFlavor.equals(flavor);
        }

        @Override
        public Object getTransferData(DataFlavor flavor) throws UnsupportedFlavorException {
            if (!isDataFlavorSupported(flavor)) {
                throw new UnsupportedFlavorException(flavor);
            }
            return image;
        }
    }
}
