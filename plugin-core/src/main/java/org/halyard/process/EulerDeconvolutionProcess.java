package org.halyard.process;

import java.util.List;
import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.targets.EulerDeconvolution;
import org.halyard.targets.EulerOptions;
import org.halyard.targets.EulerSolution;
import org.halyard.targets.FieldGrids;
import org.halyard.targets.Peak;
import org.halyard.targets.PeakOptions;
import org.halyard.targets.PeakPicker;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;

/**
 * Euler deconvolution at the analytic-signal peaks of a total-field grid and its derivatives, as a GeoTools
 * process ({@code halyard:EulerDeconvolution}). Kernel: {@link EulerDeconvolution} (Thompson 1982; Reid et
 * al. 1990); method notes in docs/targets.md.
 */
@DescribeProcess(title = "Euler deconvolution", description = "Source position and depth below the observation"
        + " level at each analytic-signal peak, by windowed least squares on Euler's equation with a structural"
        + " index (3 compact, 2 line source); only solutions with a small relative depth error are kept.")
public final class EulerDeconvolutionProcess implements HalyardProcess {

    /**
     * Runs the deconvolution.
     *
     * @return points at the accepted solutions with depth (m, positive down below the grid level), its
     *         standard error (m), the background (nT) and the peak amplitude (nT/m)
     */
    @DescribeResult(name = "result", description = "Euler solutions: depth_m positive down below the grid level,"
            + " depth_sigma_m, background_nt, amplitude (nT/m)")
    public SimpleFeatureCollection execute(
            @DescribeParameter(name = "total", description = "Total-field anomaly, nT", meta = {"unit=nT"})
                    GridCoverage2D total,
            @DescribeParameter(name = "dx", description = "Derivative towards east, nT/m", meta = {"unit=nT/m"})
                    GridCoverage2D dx,
            @DescribeParameter(name = "dy", description = "Derivative towards north, nT/m", meta = {"unit=nT/m"})
                    GridCoverage2D dy,
            @DescribeParameter(name = "dz", description = "Vertical derivative, positive down, nT/m",
                    meta = {"unit=nT/m"}) GridCoverage2D dz,
            @DescribeParameter(name = "structuralIndex", description = "N: 3 compact source, 2 cable or pipe,"
                    + " 1 thin sheet edge, dimensionless", min = 0, defaultValue = "3", minValue = 0.5, maxValue = 3,
                    meta = {"unit=1"}) Double index,
            @DescribeParameter(name = "window", description = "Side of the square solution window, m", min = 0,
                    defaultValue = "6", minValue = 0.5, maxValue = 1000, meta = {"unit=m"}) Double window,
            @DescribeParameter(name = "maxDepthError", description = "Largest accepted sigma(depth)/depth,"
                    + " dimensionless", min = 0, defaultValue = "0.15", minValue = 0.001, maxValue = 1,
                    meta = {"unit=1"}) Double maxError,
            @DescribeParameter(name = "thresholdFactor", description = "Peaks above median + k x noise of the"
                    + " analytic signal, k dimensionless", min = 0, defaultValue = "5", minValue = 0.5, maxValue = 100,
                    meta = {"unit=1"}) Double k,
            ProgressListener monitor) {
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        FieldGrids grids = new FieldGrids(FeatureTableBuilder.grid(total, "total"), FeatureTableBuilder.grid(dx, "dx"),
                FeatureTableBuilder.grid(dy, "dy"), FeatureTableBuilder.grid(dz, "dz"));
        EulerOptions eo = new EulerOptions(FeatureTableBuilder.or(index, 3),
                List.of(FeatureTableBuilder.or(window, 6)), FeatureTableBuilder.or(maxError, 0.15), 0.5);
        PeakOptions po = new PeakOptions(FeatureTableBuilder.or(k, PeakOptions.DEFAULT.thresholdFactor()),
                PeakOptions.DEFAULT.windowCells(), PeakOptions.DEFAULT.minSeparationM());
        List<Peak> peaks = PeakPicker.pick(grids.analyticSignal(), po, p.slice(0, 20)).peaks();
        FeatureTableBuilder out = new FeatureTableBuilder("euler", Point.class, total.getCoordinateReferenceSystem2D(),
                "depth_m", Double.class, "depth_sigma_m", Double.class, "background_nt", Double.class,
                "amplitude", Double.class, "structural_index", Double.class);
        GeometryFactory gf = new GeometryFactory();
        for (int i = 0; i < peaks.size(); i++) {
            p.checkCanceled();
            Peak pk = peaks.get(i);
            for (EulerSolution s : EulerDeconvolution.solve(grids, pk.x(), pk.y(), eo).stream().toList()) {
                out.add(gf.createPoint(new Coordinate(s.x(), s.y())), s.depth(), s.depthSigma(), s.background(),
                        pk.amplitude(), s.structuralIndex());
            }
            p.slice(20, 100).report(100.0 * (i + 1) / peaks.size());
        }
        p.listener().complete();
        return out.build();
    }
}
