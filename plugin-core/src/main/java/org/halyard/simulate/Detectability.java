package org.halyard.simulate;

import java.util.ArrayList;
import java.util.List;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.halyard.model.SteelSphere;

/**
 * Survey design: how large an object a line plan can find. For each burial, sensor altitude and line
 * spacing it places an induced steel sphere midway between two lines (the worst case) and finds the peak
 * total-field anomaly and the peak analytic signal along the nearer line, then the smallest mass whose
 * peaks stand {@code snr} times above the noise.
 *
 * <p><b>Algorithm:</b> the object is a point dipole of moment m = 3 V B0 / mu0 along the field
 * ({@link SteelSphere}); the sensor runs along a line at horizontal offset spacing / 2 and height
 * altitude + burial above it. Along the line the total-field anomaly T (Blakely 1995 eq. 4.13 projected on
 * the field) and the analytic signal |A| = sqrt(Tx^2 + Ty^2 + Tz^2) (Roest et al. 1992) are sampled every
 * r / 200 over +-10 r, r the closest distance, the gradients by central differences of step r / 1000.
 * Both are proportional to the mass, so the smallest detectable mass is snr sigma / (peak per kg). The
 * field falls as 1 / r^3 and the analytic signal as 1 / r^4 (Blakely 1995, ch. 4), which the tests check.
 *
 * <p><b>Limitations:</b> induced magnetisation only (remanence can raise or lower a real anomaly); one
 * sensor on the nearer line (a transverse pair helps: take its sensor nearest the object as the line
 * offset); noise white and Gaussian; no geological background.
 *
 * <p>Units: masses kg, lengths m, fields nT, gradients nT/m; line azimuth degrees clockwise from north.
 */
public final class Detectability {

    /**
     * One configuration and its figures.
     *
     * @param burialM          object depth below the seabed, m
     * @param altitudeM        sensor height above the seabed, m
     * @param lineSpacingM     distance between lines, m (the object is spacing / 2 from the nearer line)
     * @param distanceM        closest sensor-to-object distance, m
     * @param peakNtPerKg      peak |T| per kg of steel, nT/kg
     * @param peakAsNtPerMPerKg peak analytic signal per kg, nT/m/kg
     * @param minMassFieldKg   smallest mass with peak |T| >= snr * noise, kg
     * @param minMassAsKg      smallest mass with peak |A| >= snr * gradient noise, kg
     */
    public record Case(double burialM, double altitudeM, double lineSpacingM, double distanceM, double peakNtPerKg,
                       double peakAsNtPerMPerKg, double minMassFieldKg, double minMassAsKg) { }

    /**
     * The survey and its noise.
     *
     * @param field            Earth-field direction
     * @param intensityNt      Earth-field intensity, nT
     * @param lineAzimuthDeg   line direction, degrees clockwise from north
     * @param noiseNt          standard deviation of the total-field noise, nT
     * @param gradientNoiseNtPerM standard deviation of the gradient noise, nT/m (a transverse pair of
     *                         separation s has sqrt(2) noise / s)
     * @param snr              how many standard deviations a peak must reach to count as reliably detected
     */
    public record Survey(FieldDirection field, double intensityNt, double lineAzimuthDeg, double noiseNt,
                         double gradientNoiseNtPerM, double snr) {
        public Survey {
            if (!(noiseNt > 0) || !(gradientNoiseNtPerM > 0) || !(snr > 0) || !(intensityNt > 0)) {
                throw new IllegalArgumentException("noise, gradient noise, snr and field intensity must be positive");
            }
        }
    }

    private Detectability() {
    }

    /** Every combination of {@code burials x altitudes x spacings}, in that nesting order. */
    public static List<Case> table(Survey survey, double[] burials, double[] altitudes, double[] spacings) {
        List<Case> out = new ArrayList<>();
        for (double b : burials) {
            for (double a : altitudes) {
                for (double s : spacings) {
                    out.add(evaluate(survey, b, a, s));
                }
            }
        }
        return out;
    }

    /**
     * The figures of one configuration.
     *
     * @param burialM   object depth below the seabed, m, >= 0
     * @param altitudeM sensor height above the seabed, m, > 0
     * @param spacingM  line spacing, m, >= 0
     */
    public static Case evaluate(Survey survey, double burialM, double altitudeM, double spacingM) {
        if (!(burialM >= 0) || !(altitudeM > 0) || !(spacingM >= 0)) {
            throw new IllegalArgumentException("burial must be >= 0 m, altitude > 0 m and line spacing >= 0 m, got "
                    + burialM + ", " + altitudeM + ", " + spacingM);
        }
        double h = altitudeM + burialM, off = spacingM / 2;
        double r = Math.hypot(h, off);
        double m = SteelSphere.inducedMoment(1, survey.intensityNt());
        Dipole d = Dipole.along(0, 0, h, m, survey.field());
        double az = Math.toRadians(survey.lineAzimuthDeg());
        double ae = Math.sin(az), an = Math.cos(az), se = Math.cos(az), sn = -Math.sin(az);
        double step = r / 200, dd = r / 1000;
        double peakT = 0, peakA = 0;
        for (int k = -2000; k <= 2000; k++) {
            double s = k * step;
            double x = s * ae + off * se, y = s * an + off * sn;
            FieldDirection f = survey.field();
            double t = d.totalField(x, y, 0, f);
            double tx = (d.totalField(x + dd, y, 0, f) - d.totalField(x - dd, y, 0, f)) / (2 * dd);
            double ty = (d.totalField(x, y + dd, 0, f) - d.totalField(x, y - dd, 0, f)) / (2 * dd);
            double tz = (d.totalField(x, y, dd, f) - d.totalField(x, y, -dd, f)) / (2 * dd);
            peakT = Math.max(peakT, Math.abs(t));
            peakA = Math.max(peakA, Math.sqrt(tx * tx + ty * ty + tz * tz));
        }
        return new Case(burialM, altitudeM, spacingM, r, peakT, peakA, survey.snr() * survey.noiseNt() / peakT,
                survey.snr() * survey.gradientNoiseNtPerM() / peakA);
    }
}
