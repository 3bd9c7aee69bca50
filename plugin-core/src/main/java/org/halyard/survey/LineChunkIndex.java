package org.halyard.survey;

import java.util.function.Consumer;
import java.util.function.IntPredicate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * A JTS {@link STRtree} over runs of {@value #CHUNK} segments of survey lines: one envelope per run keeps
 * the tree small (10 million samples make about 300 000 entries) while queries still come down to a
 * handful of runs. Shared by the crossover finder and the line-spacing measure.
 *
 * <p><b>Thread safety:</b> queries are safe once built (the tree is built on the first query).
 */
final class LineChunkIndex {

    /** Segments per indexed run. */
    static final int CHUNK = 32;

    /** Rows {@code [from, to]} of line {@code line}: the segments (i, i+1) for from &lt;= i &lt; to. */
    record Chunk(int line, int from, int to, Envelope envelope) {
    }

    private final STRtree tree = new STRtree();
    private int count;

    /** Indexes the lines accepted by {@code include}, on positions x (east) and y (north), m. */
    LineChunkIndex(SurveyLines lines, double[] x, double[] y, IntPredicate include) {
        for (int l = 0; l < lines.lineCount(); l++) {
            if (include.test(l)) {
                forEachChunk(lines, x, y, l, c -> {
                    tree.insert(c.envelope(), c);
                    count++;
                });
            }
        }
    }

    /** Number of indexed runs. */
    int size() {
        return count;
    }

    /** Calls {@code visitor} with every run whose envelope meets {@code env}. */
    void query(Envelope env, Consumer<Chunk> visitor) {
        if (count == 0) {
            return;
        }
        tree.query(env, item -> visitor.accept((Chunk) item));
    }

    /** The runs of line {@code l}, in order, on positions x, y (m). */
    static void forEachChunk(SurveyLines lines, double[] x, double[] y, int l, Consumer<Chunk> visitor) {
        int s = lines.start(l), e = lines.end(l);
        for (int a = s; a < e - 1; a += CHUNK) {
            int b = Math.min(a + CHUNK, e - 1);
            visitor.accept(new Chunk(l, a, b, envelope(x, y, a, b)));
        }
    }

    /** The envelope of rows [from, to]. */
    static Envelope envelope(double[] x, double[] y, int from, int to) {
        double x0 = x[from], x1 = x[from], y0 = y[from], y1 = y[from];
        for (int i = from + 1; i <= to; i++) {
            x0 = Math.min(x0, x[i]);
            x1 = Math.max(x1, x[i]);
            y0 = Math.min(y0, y[i]);
            y1 = Math.max(y1, y[i]);
        }
        return new Envelope(x0, x1, y0, y1);
    }
}
