package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.targets.LinearFeature;
import org.halyard.targets.LinearFeatureDetector;
import org.halyard.targets.LinearFeatureOptions;
import org.locationtech.jts.geom.LineString;

/**
 * Cables, pipelines and chains as polylines along the ridges of an analytic-signal grid, as a GeoTools
 * process ({@code halyard:LinearFeatures}). Kernel: {@link LinearFeatureDetector}; method notes in
 * docs/targets.md.
 */
@DescribeProcess(title = "Linear features", description = "Straight or gently curved ridges of the analytic"
        + " signal, tens of metres long (cables, pipelines, chains), as polylines: Hessian ridge cells, linking,"
        + " merging of collinear pieces, simplification.")
public final class LinearFeaturesProcess implements HalyardProcess {

    /**
     * Runs the detector.
     *
     * @param data analytic signal, nT/m, projected CRS in metres
     * @return one line per feature with its length (m), azimuth (degrees clockwise from north, 0-180) and
     *         median ridge amplitude (nT/m)
     */
    @DescribeResult(name = "result", description = "Linear features: lines with length_m, azimuth_deg, amplitude")
    public SimpleFeatureCollection execute(
            @DescribeParameter(name = "data", description = "Analytic signal, nT/m", meta = {"unit=nT/m"})
                    GridCoverage2D data,
            @DescribeParameter(name = "minLength", description = "Shortest feature kept, m", min = 0,
                    defaultValue = "20", minValue = 1, maxValue = 100000, meta = {"unit=m"}) Double minLength,
            @DescribeParameter(name = "thresholdFactor", description = "Ridge cells above median + k x noise, k"
                    + " dimensionless", min = 0, defaultValue = "5", minValue = 0.5, maxValue = 100,
                    meta = {"unit=1"}) Double k,
            ProgressListener monitor) {
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        LinearFeatureOptions d = LinearFeatureOptions.DEFAULT;
        LinearFeatureOptions o = d.withThresholdAndLength(FeatureTableBuilder.or(k, d.thresholdFactor()),
                FeatureTableBuilder.or(minLength, d.minLengthM()));
        FeatureTableBuilder out = new FeatureTableBuilder("linear_features", LineString.class,
                data.getCoordinateReferenceSystem2D(), "id", Integer.class, "length_m", Double.class,
                "azimuth_deg", Double.class, "amplitude", Double.class);
        for (LinearFeature f : LinearFeatureDetector.detect(FeatureTableBuilder.grid(data, "data"), o, p)) {
            out.add(f.line(), f.id(), f.lengthM(), f.azimuthDeg(), f.amplitude());
        }
        p.listener().complete();
        return out.build();
    }
}
