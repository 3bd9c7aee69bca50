package org.halyard.targets;

import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;

/**
 * Fits a point dipole (position, depth, moment vector, optional background surface) to the total-field
 * samples of every sensor near a pick.
 *
 * <p><b>Algorithm:</b> the model is the projection of the point-dipole field on the Earth-field direction
 * (Blakely 1995, Potential Theory in Gravity and Magnetic Applications, eq. 4.13 and section 12.1; see
 * {@link Dipole}). The start position is the pick and the Euler depth; the start moment and background are
 * the linear least-squares solution at that position (the field is linear in them). Levenberg-Marquardt
 * (Commons Math, Moré 1978) then refines all parameters; position derivatives are central differences,
 * moment derivatives exact. The fields of sources fitted before (the stronger picks) are subtracted first
 * (peeling, common practice). Standard errors are the square roots of the diagonal of s^2 (J^T J)^-1 with s^2
 * the residual variance (Press et al., Numerical Recipes, 3rd ed., section 15.5).
 *
 * <p><b>Accuracy:</b> for a well-sampled isolated dipole with Gaussian noise the estimates are unbiased to
 * first order and the stated errors are one standard deviation.
 *
 * <p><b>Limitations:</b> one source: a neighbour within the fit radius biases the result. A fit that
 * climbs above the sensors, or does not converge, is reported as no fit.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class DipoleFit {

    /** Step for the position derivatives, m. */
    static final double POSITION_STEP = 1e-4;
    /** The source is kept at least this far below the median sensor depth, m. */
    static final double MIN_DEPTH_BELOW_SENSOR = 0.1;
    /** A quadratic-background refit may place the source at most this many times deeper than the plane fit. */
    static final double MAX_DEPTH_CHANGE = 1.5;

    private DipoleFit() {
    }

    /**
     * Fits a dipole to the samples within the options' radius of (x, y), from each start in turn, and keeps
     * the fit with the smallest residual that {@code accept} allows; every start sees the same samples, so
     * the residuals compare. Several starts guard against the local minima that trade position against
     * moment direction for weak sources.
     *
     * @param x      easting of the centre of the sample selection, m
     * @param y      northing of the centre of the sample selection, m
     * @param starts start positions {x (m), y (m), depth below the sensors (m, positive down)}
     * @param field  Earth-field direction (inclination positive down, declination clockwise from north)
     * @param known  sources already fitted (stronger neighbours): their field is removed from the samples
     *               first, so that their flanks do not bias this fit
     * @param accept which fits may be returned
     * @return the best fit, or empty when too few samples are near or no start gives an acceptable fit
     */
    public static Optional<DipoleFitResult> fit(SampleIndex index, FieldDirection field, double x, double y,
                                                List<double[]> starts, DipoleFitOptions options, List<Dipole> known,
                                                java.util.function.Predicate<DipoleFitResult> accept) {
        LineSamples samples = index.samples();
        int[] idx = index.near(x, y, options.radiusM());
        if (idx.length < options.minSamples()) {
            return Optional.empty();
        }
        double[][] obs = new double[idx.length][];
        double[] target = new double[idx.length];
        for (int k = 0; k < idx.length; k++) {
            int i = idx[k];
            obs[k] = new double[] {samples.x()[i], samples.y()[i], samples.z()[i]};
            target[k] = samples.anomaly()[i];
            for (Dipole d : known) {
                target[k] -= d.totalField(obs[k][0], obs[k][1], obs[k][2], field);
            }
        }
        double sensorDepth = LineSamples.medianAt(samples.z(), idx);
        if (options.background() == DipoleFitOptions.Background.AUTO) {
            return planeOrQuadratic(obs, target, field, x, y, starts, sensorDepth, options, accept);
        }
        return fitStarts(obs, target, field, x, y, starts, sensorDepth, options, options.background(), accept);
    }

    /**
     * The plane fit from every start, then the quadratic background tried only where it can pay: first as a
     * linear solve at the plane fit's source position (moments and background are linear there), and only
     * when that already lowers the criterion, as a full fit started from the plane's optimum. Isolated
     * sources keep the plane fit at its cost; a source on a neighbour's flank gets the curvature term.
     */
    private static Optional<DipoleFitResult> planeOrQuadratic(double[][] obs, double[] target, FieldDirection field,
                                                              double x, double y, List<double[]> starts,
                                                              double sensorDepth, DipoleFitOptions options,
                                                              java.util.function.Predicate<DipoleFitResult> accept) {
        DipoleFitOptions.Background plane = DipoleFitOptions.Background.PLANE;
        DipoleFitOptions.Background quadratic = DipoleFitOptions.Background.QUADRATIC;
        Optional<DipoleFitResult> best = fitStarts(obs, target, field, x, y, starts, sensorDepth, options, plane,
                accept);
        if (best.isEmpty()) {
            return best;
        }
        Dipole d = best.get().dipole();
        Model quad = new Model(obs, field, quadratic.terms, x, y);
        double[] q = quad.linearStart(d.x(), d.y(), d.z(), target);
        double[] v = quad.values(q);
        double rss = 0;
        for (int k = 0; k < v.length; k++) {
            rss += (target[k] - v[k]) * (target[k] - v[k]);
        }
        double planeBic = bic(best.get(), 6 + plane.terms);
        if (bic(rss / v.length, v.length, 6 + quadratic.terms) >= planeBic) {
            return best;
        }
        Optional<DipoleFitResult> refit = optimise(quad, target,
                new double[] {d.x(), d.y(), d.z() - sensorDepth}, sensorDepth, options).filter(accept);
        // The curvature term is there to take up a neighbour's field; a refit that instead trades the compact
        // source for a much deeper, stronger one (which the curvature then cancels) is the wrong minimum.
        boolean compact = refit.isPresent()
                && refit.get().depthBelowSensor() <= MAX_DEPTH_CHANGE * best.get().depthBelowSensor();
        return compact && bic(refit.get(), 6 + quadratic.terms) < planeBic ? refit : best;
    }

    /** Schwarz's criterion n ln(RSS / n) + k ln n for a fit of {@code k} parameters; lower is better. */
    private static double bic(DipoleFitResult r, int k) {
        return bic(r.rms() * r.rms(), r.samples(), k);
    }

    private static double bic(double meanSquare, int n, int k) {
        return n * Math.log(Math.max(meanSquare, Double.MIN_NORMAL)) + k * Math.log(n);
    }

    private static Optional<DipoleFitResult> fitStarts(double[][] obs, double[] target, FieldDirection field,
                                                       double x, double y, List<double[]> starts, double sensorDepth,
                                                       DipoleFitOptions options, DipoleFitOptions.Background background,
                                                       java.util.function.Predicate<DipoleFitResult> accept) {
        Model model = new Model(obs, field, background.terms, x, y);
        // The starts are independent optimisations of one immutable model: run them on all cores, then pick
        // in start order so the result does not depend on the scheduling.
        List<Optional<DipoleFitResult>> fits = java.util.stream.IntStream.range(0, starts.size()).parallel()
                .mapToObj(i -> optimise(model, target, starts.get(i), sensorDepth, options).filter(accept)).toList();
        Optional<DipoleFitResult> best = Optional.empty();
        for (Optional<DipoleFitResult> f : fits) {
            if (f.isPresent() && (best.isEmpty() || f.get().rms() < best.get().rms())) {
                best = f;
            }
        }
        return best;
    }

    /** {@link #fit(SampleIndex, FieldDirection, double, double, List, DipoleFitOptions, List, java.util.function.Predicate)}
     *  from one start (x, y, {@code depthBelow} m under the sensors), no known neighbours, any result accepted. */
    public static Optional<DipoleFitResult> fit(LineSamples samples, FieldDirection field, double x, double y,
                                                double depthBelow, DipoleFitOptions options) {
        return fit(new SampleIndex(samples, options.radiusM()), field, x, y, List.of(new double[] {x, y, depthBelow}),
                options, List.of(), r -> true);
    }

    private static Optional<DipoleFitResult> optimise(Model model, double[] target, double[] s, double sensorDepth,
                                                      DipoleFitOptions options) {
        double z0 = sensorDepth + Math.max(MIN_DEPTH_BELOW_SENSOR, s[2]);
        double[] start = model.linearStart(s[0], s[1], z0, target);
        double floor = sensorDepth + MIN_DEPTH_BELOW_SENSOR;
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .model(model).target(target).start(start)
                    .parameterValidator(p -> {
                        p.setEntry(2, Math.max(floor, p.getEntry(2)));
                        return p;
                    })
                    .maxIterations(options.maxIterations()).maxEvaluations(10 * options.maxIterations())
                    .build());
        } catch (TooManyIterationsException | TooManyEvaluationsException | ConvergenceException e) {
            return Optional.empty();
        }
        return result(opt, target.length, sensorDepth);
    }

    private static Optional<DipoleFitResult> result(LeastSquaresOptimizer.Optimum opt, int n, double sensorDepth) {
        RealVector p = opt.getPoint();
        int np = p.getDimension();
        if (n <= np) {
            return Optional.empty();
        }
        double rss = opt.getResiduals().dotProduct(opt.getResiduals());
        RealMatrix cov;
        try {
            cov = opt.getCovariances(1e-14).scalarMultiply(rss / (n - np));
        } catch (SingularMatrixException e) {
            return Optional.empty();
        }
        Dipole d = new Dipole(p.getEntry(0), p.getEntry(1), p.getEntry(2), p.getEntry(3), p.getEntry(4), p.getEntry(5));
        double m = d.moment();
        double varM = 0;
        for (int a = 3; a < 6; a++) {
            for (int b = 3; b < 6; b++) {
                varM += p.getEntry(a) * p.getEntry(b) * cov.getEntry(a, b);
            }
        }
        varM = m > 0 ? varM / (m * m) : 0;
        return Optional.of(new DipoleFitResult(d, np > 6 ? p.getEntry(6) : 0,
                Math.sqrt(cov.getEntry(0, 0)), Math.sqrt(cov.getEntry(1, 1)), Math.sqrt(cov.getEntry(2, 2)),
                Math.sqrt(Math.max(0, varM)), Math.sqrt(rss / n), n, sensorDepth));
    }

    /** The total-field model and its Jacobian; parameters {x0, y0, z0, mx, my, mz, background terms...}. */
    private static final class Model implements MultivariateJacobianFunction {
        private final double[][] obs;
        private final FieldDirection f;
        private final int terms;
        private final double xRef, yRef;

        Model(double[][] obs, FieldDirection f, int terms, double xRef, double yRef) {
            this.obs = obs;
            this.f = f;
            this.terms = terms;
            this.xRef = xRef;
            this.yRef = yRef;
        }

        int parameters() {
            return 6 + terms;
        }

        /** Total field at sample k of a unit moment along axis a (0 east, 1 north, 2 down) at (x, y, z). */
        double unitResponse(int k, double x, double y, double z, int a) {
            Dipole d = new Dipole(x, y, z, a == 0 ? 1 : 0, a == 1 ? 1 : 0, a == 2 ? 1 : 0);
            return d.totalField(obs[k][0], obs[k][1], obs[k][2], f);
        }

        /** Derivative of the background at sample k with respect to its term t: 1, x - x0, y - y0. */
        double backgroundTerm(int k, int t) {
            double dx = obs[k][0] - xRef, dy = obs[k][1] - yRef;
            return switch (t) {
                case 0 -> 1;
                case 1 -> dx;
                case 2 -> dy;
                case 3 -> dx * dx;
                case 4 -> dx * dy;
                default -> dy * dy;
            };
        }

        /** The linear columns at sample k: unit moments then background terms. */
        void linearRow(int k, double x, double y, double z, double[] out, int from) {
            for (int a = 0; a < 3; a++) {
                out[from + a] = unitResponse(k, x, y, z, a);
            }
            for (int t = 0; t < terms; t++) {
                out[from + 3 + t] = backgroundTerm(k, t);
            }
        }

        /** Start vector at (x, y, z): moment and background by linear least squares. */
        double[] linearStart(double x, double y, double z, double[] target) {
            double[][] a = new double[obs.length][3 + terms];
            for (int k = 0; k < obs.length; k++) {
                linearRow(k, x, y, z, a[k], 0);
            }
            double[] start = new double[parameters()];
            start[0] = x;
            start[1] = y;
            start[2] = z;
            try {
                RealVector s = new QRDecomposition(new Array2DRowRealMatrix(a, false)).getSolver()
                        .solve(new ArrayRealVector(target, false));
                for (int c = 0; c < 3 + terms; c++) {
                    start[3 + c] = s.getEntry(c);
                }
            } catch (SingularMatrixException e) {
                // leave a zero moment: Levenberg-Marquardt still moves from there
            }
            return start;
        }

        double[] values(double[] p) {
            Dipole d = new Dipole(p[0], p[1], p[2], p[3], p[4], p[5]);
            double[] v = new double[obs.length];
            for (int k = 0; k < obs.length; k++) {
                v[k] = d.totalField(obs[k][0], obs[k][1], obs[k][2], f);
                for (int t = 0; t < terms; t++) {
                    v[k] += p[6 + t] * backgroundTerm(k, t);
                }
            }
            return v;
        }

        @Override
        public Pair<RealVector, RealMatrix> value(RealVector point) {
            double[] p = point.toArray();
            double[] v = values(p);
            double[][] j = new double[obs.length][parameters()];
            for (int a = 0; a < 3; a++) {
                double[] hi = p.clone();
                double[] lo = p.clone();
                hi[a] += POSITION_STEP;
                lo[a] -= POSITION_STEP;
                double[] vh = values(hi);
                double[] vl = values(lo);
                for (int k = 0; k < obs.length; k++) {
                    j[k][a] = (vh[k] - vl[k]) / (2 * POSITION_STEP);
                }
            }
            for (int k = 0; k < obs.length; k++) {
                linearRow(k, p[0], p[1], p[2], j[k], 3);
            }
            return new Pair<>(new ArrayRealVector(v, false), new Array2DRowRealMatrix(j, false));
        }
    }
}
