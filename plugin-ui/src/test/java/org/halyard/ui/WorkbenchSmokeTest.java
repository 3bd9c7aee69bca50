package org.halyard.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Stream;
import javax.swing.SwingUtilities;
import org.halyard.process.ProcessCatalog;
import org.halyard.ui.map.GridLayer;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Opens the real workbench window on demo files (and on the sample workspace's recipe when there is one),
 * takes screenshots into {@code target/} and closes. Needs a display: run it under Xvfb with
 * {@code -Dhalyard.gui=true} (see docs/workbench.md); skipped otherwise.
 */
@Tag("gui")
class WorkbenchSmokeTest {

    private static final Path OUT = Path.of("target", "workbench-smoke");

    @BeforeAll
    static void needsADisplay() {
        assumeTrue(Boolean.getBoolean("halyard.gui"), "GUI smoke test: run with -Dhalyard.gui=true under xvfb-run");
        assumeTrue(System.getenv("DISPLAY") != null, "no DISPLAY: run under xvfb-run");
        // surefire starts the JVM headless for the other tests; this class runs in its own invocation
        System.setProperty("java.awt.headless", "false");
    }

    @Test
    void opensOnFilesShowsTheMapAndCloses() throws Exception {
        List<Path> files = DemoFiles.write(OUT.resolve("data"));
        WorkbenchFrame frame = openOn(files);
        try {
            assertThat(frame.getTitle()).startsWith("Halyard");
            assertThat(frame.layers().size()).isEqualTo(5);
            SwingUtilities.invokeAndWait(() -> {
                frame.selectTarget(2);
                frame.showProfile(new Line2D.Double(500_020, 6_000_220, 500_240, 6_000_220));
            });
            BufferedImage main = shoot(frame, "workbench-map.png");
            assertThat(distinctColours(main)).as("a drawn window, not a blank one").isGreaterThan(200);
            SwingUtilities.invokeAndWait(() -> frame.showOperator(ProcessCatalog.all().get(0).qualifiedName()));
            shoot(frame, "workbench-operators.png");
            SwingUtilities.invokeAndWait(() -> {
                GridLayer tf = frame.layers().ofType(GridLayer.class).get(frame.layers().ofType(GridLayer.class).size() - 1);
                tf.setStyle(tf.style().withShading(new org.halyard.render.Shading(
                        new org.halyard.render.SunPosition(315, 40), 0.5, 0.6)));
                frame.layers().changed();
            });
            shoot(frame, "workbench-shaded.png");
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    @Test
    void opensTheSampleWorkspaceRecipeWhenPresent() throws Exception {
        Path root = Path.of("..", "sample-workspace");
        List<Path> recipes = new ArrayList<>();
        if (Files.isDirectory(root)) {
            try (Stream<Path> s = Files.walk(root, 3)) {
                s.filter(p -> p.getFileName().toString().equals("recipe.json")).forEach(recipes::add);
            }
        }
        assumeTrue(!recipes.isEmpty(), "no sample-workspace recipe in this checkout yet");
        WorkbenchFrame frame = openOn(List.of(recipes.get(0)));
        try {
            assertThat(frame.getTitle()).startsWith("Halyard");
            shoot(frame, "workbench-sample-workspace.png");
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    private static WorkbenchFrame openOn(List<Path> files) throws Exception {
        AtomicReference<WorkbenchFrame> ref = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            WorkbenchFrame f = new WorkbenchFrame();
            f.setSize(1500, 940);
            f.setVisible(true);
            f.open(files);
            ref.set(f);
        });
        assertThat(ref.get().awaitLoaded(3, TimeUnit.MINUTES)).as("files loaded").isTrue();
        return ref.get();
    }

    private static BufferedImage shoot(WorkbenchFrame frame, String name) throws Exception {
        settle(frame);
        AtomicReference<BufferedImage> img = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            BufferedImage b = new BufferedImage(frame.getWidth(), frame.getHeight(), BufferedImage.TYPE_INT_RGB);
            var g = b.createGraphics();
            frame.paintAll(g);
            g.dispose();
            img.set(b);
        });
        Files.createDirectories(OUT);
        ViewExport.writePng(img.get(), OUT.resolve(name));
        return img.get();
    }

    /** Waits for background tiles to arrive and the event queue to drain. */
    private static void settle(WorkbenchFrame frame) throws Exception {
        for (int i = 0; i < 600; i++) {
            AtomicReference<Integer> pending = new AtomicReference<>(0);
            SwingUtilities.invokeAndWait(() -> {
                frame.canvas().paintImmediately(0, 0, frame.canvas().getWidth(), frame.canvas().getHeight());
                pending.set(frame.layers().ofType(GridLayer.class).stream().mapToInt(GridLayer::pendingTiles).sum());
            });
            if (pending.get() == 0 && i > 3) {
                break;
            }
            Thread.sleep(100);
        }
        SwingUtilities.invokeAndWait(() -> { });
    }

    private static int distinctColours(BufferedImage img) {
        Set<Integer> s = new HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                s.add(img.getRGB(x, y) & 0xFFFFFF);
            }
        }
        s.remove(Color.WHITE.getRGB() & 0xFFFFFF);
        return s.size();
    }
}
