package org.halyard.targets;

/**
 * Every parameter of {@link TargetAnalysis}, grouped by stage.
 *
 * @param peaks          peak picking
 * @param discreteEuler  Euler deconvolution for discrete picks (structural index 3)
 * @param linearEuler    Euler deconvolution on linear features (structural index 2)
 * @param fit            dipole fits
 * @param mass           moment-to-mass model
 * @param linear         linear-feature detection
 * @param assetBufferM   infrastructure match distance, m
 * @param assetMinShare  share of a feature's length that must lie within the buffer, 0 to 1
 * @param startDepthM    dipole-fit start depth below the sensors where Euler gives none, m
 */
public record TargetOptions(PeakOptions peaks, EulerOptions discreteEuler, EulerOptions linearEuler,
                            DipoleFitOptions fit, SteelMassModel mass, LinearFeatureOptions linear,
                            double assetBufferM, double assetMinShare, double startDepthM) {

    /** The defaults of each stage; a 10 m match buffer (assumed chart accuracy), half the length shared. */
    public static final TargetOptions DEFAULT = new TargetOptions(PeakOptions.DEFAULT, EulerOptions.DISCRETE,
            EulerOptions.LINEAR, DipoleFitOptions.DEFAULT, SteelMassModel.DEFAULT, LinearFeatureOptions.DEFAULT,
            10, 0.5, 2);

    public TargetOptions {
        if (!(startDepthM > 0)) {
            throw new IllegalArgumentException("dipole-fit start depth must be positive metres, got " + startDepthM);
        }
    }

    /** A one-line account of the methods and parameters, for output metadata. */
    public String describe() {
        return "peaks: local maxima of the analytic signal (Gaussian-smoothed, " + num(PeakPicker.SMOOTHING_CELLS)
                + " cell) above the " + num(PeakPicker.BACKGROUND_TILE_M) + " m tile median + " + peaks.thresholdFactor()
                + " x fourth-difference noise (1.4826 MAD / sqrt 70), window " + (2 * peaks.windowCells() + 1)
                + " cells, separation "
                + peaks.minSeparationM() + " m, parabolic sub-cell refinement; Euler deconvolution (Thompson 1982,"
                + " Reid et al. 1990) SI " + discreteEuler.structuralIndex() + " discrete / SI "
                + linearEuler.structuralIndex() + " linear, windows " + discreteEuler.windowSizesM()
                + " m, depth error <= " + discreteEuler.maxRelativeDepthError() + "; dipole fit (Levenberg-Marquardt)"
                + " radius " + fit.radiusM() + " m, background " + fit.background().name().toLowerCase(java.util.Locale.ROOT)
                + "; linear features: Hessian ridges of the analytic signal smoothed by " + linear.smoothingM()
                + " m and by " + linear.strikeSmoothingM() + " m along their strike, above the "
                + num(LinearFeatureDetector.BACKGROUND_TILE_M) + " m tile median + " + linear.thresholdFactor()
                + " x noise, at least "
                + linear.minLengthM() + " m, Euler SI " + linearEuler.structuralIndex() + " accepted at >= "
                + linear.minEulerShare() + " of the stations; asset buffer " + assetBufferM + " m";
    }

    /** A whole number without its ".0", as the description has always printed these figures. */
    private static String num(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
