package org.halyard.spectral;

/**
 * The filters a user can run on a grid, by their command-line names (CONTRACT.md), with the unit of the
 * result for a total-field input in nT.
 */
public enum FilterOperation {
    /** Reduction to the pole (Baranov 1957), nT. */
    REDUCE_TO_POLE("reduce-to-pole", "nT", "Reduction to the pole"),
    /** Upward continuation, nT. */
    UPWARD("upward", "nT", "Upward continuation"),
    /** Regularised downward continuation, nT. */
    DOWNWARD("downward", "nT", "Downward continuation (regularised)"),
    /** Vertical derivative of order n, z down, nT/m^n. */
    VERTICAL_DERIVATIVE("vertical-derivative", "nT/m^n", "Vertical derivative"),
    /** Derivative towards east, nT/m. */
    DX("dx", "nT/m", "East derivative"),
    /** Derivative towards north, nT/m. */
    DY("dy", "nT/m", "North derivative"),
    /** sqrt(Tx^2 + Ty^2), nT/m. */
    TOTAL_HORIZONTAL_GRADIENT("total-horizontal-gradient", "nT/m", "Total horizontal gradient"),
    /** 3-D analytic signal amplitude sqrt(Tx^2 + Ty^2 + Tz^2), nT/m (Roest et al. 1992). */
    ANALYTIC_SIGNAL("analytic-signal", "nT/m", "Analytic signal amplitude"),
    /** Tilt angle atan2(Tz, sqrt(Tx^2 + Ty^2)), degrees (Miller and Singh 1994). */
    TILT("tilt", "degrees", "Tilt angle"),
    /** Total horizontal derivative of the tilt angle, degrees/m (Verduzco et al. 2004). */
    TILT_HORIZONTAL_DERIVATIVE("tilt-horizontal-derivative", "degrees/m", "Horizontal derivative of the tilt");

    private final String cliName;
    private final String unit;
    private final String title;

    FilterOperation(String cliName, String unit, String title) {
        this.cliName = cliName;
        this.unit = unit;
        this.title = title;
    }

    /** The name used on the command line, e.g. {@code reduce-to-pole}. */
    public String cliName() {
        return cliName;
    }

    /** Unit of the result for a total-field grid in nT. */
    public String unit() {
        return unit;
    }

    /** A short human title. */
    public String title() {
        return title;
    }

    /** The operation of a command-line name; the error lists the valid names. */
    public static FilterOperation ofCliName(String name) {
        for (FilterOperation op : values()) {
            if (op.cliName.equals(name)) {
                return op;
            }
        }
        StringBuilder sb = new StringBuilder();
        for (FilterOperation op : values()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(op.cliName);
        }
        throw new IllegalArgumentException("unknown filter '" + name + "'; choose one of: " + sb);
    }
}
