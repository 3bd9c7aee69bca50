package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/** Greedy word wrapping by the standard fonts' metrics. */
final class TextWrap {

    private TextWrap() {
    }

    /** {@code text} broken into lines no wider than {@code width} points at {@code size} points. */
    static List<String> lines(String text, float width, float size, boolean bold) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : SheetCanvas.printable(text).split("\\s+")) {
            String tryLine = line.isEmpty() ? word : line + " " + word;
            if (!line.isEmpty() && SheetCanvas.textWidth(tryLine, size, bold) > width) {
                out.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(tryLine);
            }
        }
        if (!line.isEmpty()) {
            out.add(line.toString());
        }
        return out;
    }

    /** Draws wrapped lines from the top of {@code r} down; returns the height used, points. */
    static float draw(SheetCanvas c, String text, PageRect r, float size, boolean bold) {
        float lead = size * 1.25f;
        float y = r.top() - size;
        List<String> ls = lines(text, r.width(), size, bold);
        for (String l : ls) {
            c.text(l, r.x(), y, size, bold);
            y -= lead;
        }
        return ls.size() * lead;
    }

    /** Height {@link #draw} will use, points. */
    static float height(String text, float width, float size, boolean bold) {
        return lines(text, width, size, bold).size() * size * 1.25f;
    }
}
