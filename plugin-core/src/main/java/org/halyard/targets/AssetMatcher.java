package org.halyard.targets;

import java.util.List;
import java.util.Optional;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * Matches linear features and targets to charted infrastructure within a buffer distance.
 *
 * <p><b>Algorithm:</b> a linear feature matches the asset whose buffer of {@code bufferM} holds the largest
 * share of the feature's length (JTS overlay), when that share is at least {@code minShare}; a point matches
 * the nearest asset within {@code bufferM}. Charts and positioning disagree by metres, so the buffer is the
 * stated uncertainty of the chart (common practice).
 *
 * <p><b>Limitations:</b> linear in the number of assets per query; fine for the hundreds of features of a
 * survey block.
 *
 * <p><b>Thread safety:</b> immutable; the buffers are computed once in the constructor.
 */
public final class AssetMatcher {

    private final List<Asset> assets;
    private final Geometry[] buffers;
    private final double bufferM;
    private final double minShare;
    private final GeometryFactory gf = new GeometryFactory();

    /**
     * @param bufferM  match distance, m, non-negative
     * @param minShare least share (0 to 1] of a feature's length that must lie in the buffer
     */
    public AssetMatcher(List<Asset> assets, double bufferM, double minShare) {
        if (!(bufferM >= 0) || !(minShare > 0 && minShare <= 1)) {
            throw new IllegalArgumentException("asset match needs a buffer of 0 m or more and a share in (0, 1], got "
                    + bufferM + " m and " + minShare);
        }
        this.assets = List.copyOf(assets);
        this.bufferM = bufferM;
        this.minShare = minShare;
        this.buffers = this.assets.stream().map(a -> a.geometry().buffer(bufferM)).toArray(Geometry[]::new);
    }

    /** The id of the asset a feature line follows, empty when uncharted. */
    public Optional<String> match(LineString line) {
        double len = line.getLength();
        double best = 0;
        String id = null;
        for (int i = 0; i < assets.size(); i++) {
            if (!buffers[i].getEnvelopeInternal().intersects(line.getEnvelopeInternal())) {
                continue;
            }
            double share = len > 0 ? line.intersection(buffers[i]).getLength() / len : 0;
            if (share > best) {
                best = share;
                id = assets.get(i).id();
            }
        }
        return best >= minShare ? Optional.of(id) : Optional.empty();
    }

    /** The id of the nearest asset within the buffer of (x, y) (m), empty when none. */
    public Optional<String> match(double x, double y) {
        Geometry p = gf.createPoint(new Coordinate(x, y));
        double best = Double.POSITIVE_INFINITY;
        String id = null;
        for (Asset a : assets) {
            double d = a.geometry().distance(p);
            if (d <= bufferM && d < best) {
                best = d;
                id = a.id();
            }
        }
        return Optional.ofNullable(id);
    }
}
