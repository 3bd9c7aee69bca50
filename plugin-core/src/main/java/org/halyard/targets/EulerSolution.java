package org.halyard.targets;

/**
 * One accepted Euler deconvolution solution.
 *
 * @param x               easting of the source, m
 * @param y               northing of the source, m
 * @param depth           depth of the source below the observation level, m, positive down
 * @param background      the constant background B of the Euler equation, nT
 * @param depthSigma      standard error of the depth from the least-squares covariance, m
 * @param structuralIndex N used
 * @param windowM         side of the window that gave this solution, m
 * @param samples         number of grid cells in the solve
 */
public record EulerSolution(double x, double y, double depth, double background, double depthSigma,
                            double structuralIndex, double windowM, int samples) {

    /** sigma(depth) / depth. */
    public double relativeDepthError() {
        return depthSigma / Math.abs(depth);
    }
}
