package org.halyard.sheet;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The symbols targets are marked with, one per class: an open ring with a centre dot for
 * {@code discrete}, an open diamond for {@code linear}, an open square for any other class. Sizes are in
 * points and do not scale with the map.
 */
public final class TargetSymbols {

    /** Symbol radius, points. */
    static final float RADIUS = 3.2f;

    private static final int DISCRETE_RGB = 0xC0122B;
    private static final int LINEAR_RGB = 0x1F4FB8;
    private static final int OTHER_RGB = 0x6B2C91;

    private TargetSymbols() {
    }

    /** Draws the symbol of {@code targetClass} centred on page point (px, py). */
    public static void draw(SheetCanvas c, String targetClass, double px, double py) {
        String k = targetClass.toLowerCase(Locale.ROOT);
        switch (k) {
            case "discrete" -> {
                c.stroke(DISCRETE_RGB, 0.8f);
                c.circle(px, py, RADIUS, false);
                c.fill(DISCRETE_RGB);
                c.circle(px, py, 0.7, true);
            }
            case "linear" -> {
                c.stroke(LINEAR_RGB, 0.8f);
                c.polyline(new double[] {px, px + RADIUS, px, px - RADIUS},
                        new double[] {py + RADIUS, py, py - RADIUS, py}, true);
            }
            default -> {
                c.stroke(OTHER_RGB, 0.8f);
                float h = RADIUS * 0.85f;
                c.strokeRect(new PageRect((float) px - h, (float) py - h, 2 * h, 2 * h));
            }
        }
    }

    /** Legend entries for the classes present in {@code targets}, in order of first appearance. */
    public static List<LegendEntry> legend(List<TargetMark> targets) {
        Set<String> classes = new LinkedHashSet<>();
        targets.forEach(t -> classes.add(t.targetClass().toLowerCase(Locale.ROOT)));
        return classes.stream().map(k -> new LegendEntry(describe(k),
                (c, r) -> draw(c, k, r.x() + r.width() / 2, r.y() + r.height() / 2))).toList();
    }

    private static String describe(String k) {
        return switch (k) {
            case "discrete" -> "Target, discrete (compact ferrous source)";
            case "linear" -> "Target, linear (cable- or pipe-like)";
            default -> "Target, " + k;
        };
    }
}
