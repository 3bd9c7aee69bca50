package org.halyard.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A cable or pipe modelled as a dense line of equal point dipoles along a polyline, magnetised by
 * induction along the Earth field.
 *
 * <p><b>Algorithm:</b> the polyline is cut into pieces no longer than {@code spacing}; each piece carries a
 * dipole of moment {@code momentPerMetre * pieceLength} at its midpoint, along the field direction, and
 * the anomaly is the sum of {@link Dipole} anomalies (the midpoint rule for the line integral of the dipole
 * field, exact in the limit of small spacing; DOMAIN.md, forward models).
 *
 * <p><b>Accuracy:</b> the midpoint-rule error falls as (spacing / distance)^2; keep the spacing below a
 * third of the closest sensor distance. Tested against the closed form of an infinite line of dipoles.
 *
 * <p><b>Limitations:</b> induced magnetisation only, uniform along the line; the transverse/longitudinal
 * anisotropy of a real pipe's magnetisation is not modelled.
 *
 * <p><b>Thread safety:</b> immutable.
 */
public final class DipoleLine {

    private final double[] vertices;
    private final double momentPerMetre;
    private final FieldDirection direction;
    private final double spacing;
    private final Dipole[] dipoles;

    /**
     * @param vertices       polyline vertices as {@code x0, y0, z0, x1, y1, z1, ...}: easting, northing, metres,
     *                       depth in metres positive down; at least two vertices
     * @param momentPerMetre induced moment per metre of line, A m2 / m, along {@code direction}
     * @param direction      magnetisation direction (normally the Earth-field direction)
     * @param spacing        largest distance between neighbouring dipoles, m, positive
     */
    public DipoleLine(double[] vertices, double momentPerMetre, FieldDirection direction, double spacing) {
        if (vertices.length < 6 || vertices.length % 3 != 0) {
            throw new IllegalArgumentException("a dipole line needs at least two vertices given as x, y, z triples, got "
                    + vertices.length + " numbers");
        }
        if (!(spacing > 0) || Double.isInfinite(spacing)) {
            throw new IllegalArgumentException("dipole spacing must be a positive number of metres, got " + spacing);
        }
        if (!Double.isFinite(momentPerMetre)) {
            throw new IllegalArgumentException("moment per metre must be finite, got " + momentPerMetre);
        }
        this.vertices = vertices.clone();
        this.momentPerMetre = momentPerMetre;
        this.direction = direction;
        this.spacing = spacing;
        List<Dipole> list = new ArrayList<>();
        for (int v = 0; v + 5 < vertices.length; v += 3) {
            double x0 = vertices[v], y0 = vertices[v + 1], z0 = vertices[v + 2];
            double dx = vertices[v + 3] - x0, dy = vertices[v + 4] - y0, dz = vertices[v + 5] - z0;
            double len = Math.sqrt(dx * dx + dy * dy + dz * dz);
            int n = (int) Math.max(1, Math.ceil(len / spacing));
            double piece = len / n;
            for (int k = 0; k < n; k++) {
                double t = (k + 0.5) / n;
                list.add(Dipole.along(x0 + t * dx, y0 + t * dy, z0 + t * dz, momentPerMetre * piece, direction));
            }
        }
        this.dipoles = list.toArray(new Dipole[0]);
    }

    /**
     * Induced moment per metre of a steel pipe or cable armour of {@code massPerMetre} kg/m, treated as a
     * highly permeable cylinder in a transverse field: M = 2 H0, so m' = 2 (massPerMetre / 7850) B0 / mu0
     * (textbook magnetostatics, demagnetising factor 1/2 across a long cylinder).
     *
     * @param massPerMetre steel mass per metre of line, kg/m
     * @param fieldNt      Earth-field intensity, nT
     * @return moment per metre, A m2 / m
     */
    public static double inducedMomentPerMetre(double massPerMetre, double fieldNt) {
        return 2 * (massPerMetre / SteelSphere.STEEL_DENSITY) * fieldNt * 1e-9 / SteelSphere.MU0;
    }

    /** The vertices as {@code x, y, z} triples (a copy). */
    public double[] vertices() {
        return vertices.clone();
    }

    /** Moment per metre, A m2 / m. */
    public double momentPerMetre() {
        return momentPerMetre;
    }

    /** Magnetisation direction. */
    public FieldDirection direction() {
        return direction;
    }

    /** Largest distance between neighbouring dipoles, m. */
    public double spacing() {
        return spacing;
    }

    /** Number of dipoles the line is cut into. */
    public int dipoleCount() {
        return dipoles.length;
    }

    /** Length of the polyline, m. */
    public double length() {
        double s = 0;
        for (int v = 0; v + 5 < vertices.length; v += 3) {
            double dx = vertices[v + 3] - vertices[v], dy = vertices[v + 4] - vertices[v + 1];
            double dz = vertices[v + 5] - vertices[v + 2];
            s += Math.sqrt(dx * dx + dy * dy + dz * dz);
        }
        return s;
    }

    /**
     * Total-field anomaly in nT at an observation point: the sum of the dipoles' anomalies projected on
     * {@code field}.
     *
     * @param px    easting, m
     * @param py    northing, m
     * @param pz    depth of the observation, m, positive down
     * @param field Earth-field direction for the projection
     */
    public double totalField(double px, double py, double pz, FieldDirection field) {
        double fe = field.east(), fn = field.north(), fd = field.down();
        double s = 0;
        for (Dipole d : dipoles) {
            s += Dipole.totalField(px - d.x(), py - d.y(), pz - d.z(), d.mx(), d.my(), d.mz(), fe, fn, fd);
        }
        return s;
    }
}
