package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Locale;

/**
 * Distinct symbols for target classes: shape and colour both differ, so classes stay apart in greyscale
 * print and for colour-blind readers.
 *
 * <p>The machine classes of {@code targets.csv} ({@code discrete}, {@code linear}) and the interpretation
 * classes an analyst can set each have their own symbol; anything else is a ring.
 */
public final class TargetSymbols {

    /** A symbol: shape family and colour. */
    public enum Symbol {
        DIAMOND, BAR, TRIANGLE, SQUARE, CIRCLE, CROSS, RING
    }

    /** One class and how it is drawn. */
    public record ClassStyle(String name, Symbol symbol, Color colour) { }

    /** The classes the interpretation editor offers, machine classes first. */
    public static final List<ClassStyle> CLASSES = List.of(
            new ClassStyle("discrete", Symbol.DIAMOND, new Color(0xD9, 0x48, 0x0F)),
            new ClassStyle("linear", Symbol.BAR, new Color(0x8E, 0x3B, 0xA6)),
            new ClassStyle("possible object", Symbol.TRIANGLE, new Color(0xC1, 0x12, 0x1F)),
            new ClassStyle("debris", Symbol.SQUARE, new Color(0xA8, 0x74, 0x12)),
            new ClassStyle("cable or pipe", Symbol.BAR, new Color(0xB0, 0x2E, 0x8A)),
            new ClassStyle("geology", Symbol.CIRCLE, new Color(0x4E, 0x7A, 0x32)),
            new ClassStyle("no further action", Symbol.CROSS, new Color(0x5E, 0x66, 0x6C)));

    private static final ClassStyle OTHER = new ClassStyle("other", Symbol.RING, new Color(0x24, 0x30, 0x38));

    private TargetSymbols() {
    }

    /** The style of class {@code name} (case-insensitive); unknown or blank classes get a dark ring. */
    public static ClassStyle of(String name) {
        if (name != null) {
            String n = name.trim().toLowerCase(Locale.ROOT);
            for (ClassStyle c : CLASSES) {
                if (c.name.equals(n)) {
                    return c;
                }
            }
        }
        return OTHER;
    }

    /** Draws {@code style} centred on screen (x, y), {@code size} pixels across, with a pale halo. */
    public static void draw(Graphics2D g, ClassStyle style, double x, double y, double size) {
        Shape s = shape(style.symbol(), x, y, size);
        boolean outline = style.symbol() == Symbol.CROSS || style.symbol() == Symbol.RING;
        g.setStroke(new BasicStroke(outline ? 4.5f : 3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.setColor(new Color(255, 255, 250, 220));
        g.draw(s);
        g.setColor(style.colour());
        if (outline) {
            g.setStroke(new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(s);
        } else {
            g.fill(s);
        }
    }

    static Shape shape(Symbol symbol, double x, double y, double size) {
        double h = size / 2;
        Path2D.Double p = new Path2D.Double();
        switch (symbol) {
            case DIAMOND -> {
                p.moveTo(x, y - h);
                p.lineTo(x + h, y);
                p.lineTo(x, y + h);
                p.lineTo(x - h, y);
                p.closePath();
            }
            case TRIANGLE -> {
                p.moveTo(x, y - h);
                p.lineTo(x + h, y + h * 0.8);
                p.lineTo(x - h, y + h * 0.8);
                p.closePath();
            }
            case CROSS -> {
                p.moveTo(x - h * 0.8, y - h * 0.8);
                p.lineTo(x + h * 0.8, y + h * 0.8);
                p.moveTo(x + h * 0.8, y - h * 0.8);
                p.lineTo(x - h * 0.8, y + h * 0.8);
            }
            case BAR -> {
                return new Rectangle2D.Double(x - h * 1.2, y - h * 0.4, size * 1.2, size * 0.4);
            }
            case SQUARE -> {
                return new Rectangle2D.Double(x - h * 0.8, y - h * 0.8, size * 0.8, size * 0.8);
            }
            case CIRCLE, RING -> {
                return new Ellipse2D.Double(x - h * 0.85, y - h * 0.85, size * 0.85, size * 0.85);
            }
            default -> throw new IllegalArgumentException("unknown symbol " + symbol);
        }
        return p;
    }
}
