package org.halyard.survey;

/**
 * A base-station (observatory or variometer) record of the geomagnetic field, as read from IAGA-2002.
 *
 * <p>Components are in the geographic frame: {@code north} (X), {@code east} (Y), {@code down} (Z), nT,
 * converted from H, D, Z where the file reported those. {@code total} is the total field F in nT, either
 * as recorded or, where the file records no F, computed as sqrt(X^2 + Y^2 + Z^2). Missing samples
 * (99999.00) and samples not recorded (88888.00) are NaN.
 *
 * @param source          the file name, for messages
 * @param stationCode     the IAGA code in the file (may be blank)
 * @param reported        the layout the file reported, e.g. {@code XYZF} or {@code HDZF}
 * @param time            epoch seconds (UTC) per sample, strictly increasing
 * @param north           X per sample, nT
 * @param east            Y per sample, nT
 * @param down            Z per sample, nT, positive down
 * @param total           F per sample, nT
 * @param totalComputed   whether F was computed from the components because the file records none
 * @param cadenceSeconds  the median sample interval, s (1 or 60 for the usual products)
 * @param missingCount    number of values marked missing (99999.00)
 * @param notRecordedCount number of values marked not recorded (88888.00)
 */
public record BaseStation(String source, String stationCode, String reported, double[] time, double[] north,
                          double[] east, double[] down, double[] total, boolean totalComputed,
                          double cadenceSeconds, int missingCount, int notRecordedCount) {

    public BaseStation {
        int n = time.length;
        if (north.length != n || east.length != n || down.length != n || total.length != n) {
            throw new IllegalArgumentException(source + ": base-station arrays differ in length");
        }
        if (n < 2) {
            throw new IllegalArgumentException(source + ": a base station needs at least two samples, found " + n);
        }
    }

    /** Number of samples (valid or not). */
    public int size() {
        return time.length;
    }
}
