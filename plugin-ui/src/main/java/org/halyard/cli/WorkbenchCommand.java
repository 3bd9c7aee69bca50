package org.halyard.cli;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import javax.swing.SwingUtilities;
import org.halyard.ui.WorkbenchFrame;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code halyard workbench [RECIPE.json | FILE...]}: opens the desktop workbench and waits until it is closed. */
@Command(name = "workbench", description = "Open the desktop workbench on a recipe or on grids (.tif), GeoPackages,"
        + " GeoJSON and CSV point files.")
final class WorkbenchCommand implements Callable<Integer> {

    @Parameters(arity = "0..*", paramLabel = "RECIPE.json | FILE", description = "What to open.")
    List<Path> files = new ArrayList<>();

    @Override
    public Integer call() throws Exception {
        for (Path f : files) {
            if (!Files.isRegularFile(f)) {
                throw new IllegalArgumentException(f + ": file does not exist");
            }
        }
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalArgumentException("the workbench needs a display: set DISPLAY, or run it under xvfb-run");
        }
        CountDownLatch closed = new CountDownLatch(1);
        SwingUtilities.invokeAndWait(() -> {
            WorkbenchFrame f = new WorkbenchFrame();
            f.addWindowListener(new java.awt.event.WindowAdapter() {
                @Override
                public void windowClosed(java.awt.event.WindowEvent e) {
                    closed.countDown();
                }
            });
            f.setVisible(true);
            f.open(files);
        });
        closed.await();
        return 0;
    }
}
