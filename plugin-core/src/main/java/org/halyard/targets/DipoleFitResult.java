package org.halyard.targets;

import org.halyard.model.Dipole;

/**
 * A fitted point dipole and its standard errors.
 *
 * @param dipole      the dipole: position (x east, y north, z depth below the sea surface, positive down, m)
 *                    and moment (A m2)
 * @param background  fitted background at the start position, nT (0 when not fitted)
 * @param sigmaX      standard error of the easting, m
 * @param sigmaY      standard error of the northing, m
 * @param sigmaZ      standard error of the depth, m
 * @param sigmaMoment standard error of the moment magnitude, A m2 (first-order propagation)
 * @param rms         RMS residual, nT
 * @param samples     number of samples fitted
 * @param sensorDepth median sensor depth of the samples fitted, m, positive down
 */
public record DipoleFitResult(Dipole dipole, double background, double sigmaX, double sigmaY, double sigmaZ,
                              double sigmaMoment, double rms, int samples, double sensorDepth) {

    /** Depth of the dipole below the median sensor level, m, positive down. */
    public double depthBelowSensor() {
        return dipole.z() - sensorDepth;
    }
}
