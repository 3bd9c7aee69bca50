package org.halyard.pipeline;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.halyard.model.FieldDirection;
import org.halyard.survey.LagOptions;
import org.halyard.survey.MicroLevelling;
import org.halyard.survey.SensorSpec;

/**
 * A parsed run recipe (CONTRACT.md, "Recipe"); paths are resolved against the recipe's folder. Optional
 * blocks are null when absent.
 *
 * @param file           the recipe file itself
 * @param name           free text naming the job
 * @param crs            projected CRS of the survey coordinates and every output, e.g. {@code EPSG:32631}
 * @param survey         the survey lines
 * @param baseStation    the IAGA-2002 base-station file, or null
 * @param field          the Earth field, or null (then taken from the base station where possible)
 * @param grid           gridding parameters (defaults when the block is absent)
 * @param bathymetry     seabed depth grid (metres, positive down), or null
 * @param infrastructure GeoPackage of charted infrastructure, or null
 * @param targets        target-picking parameters (defaults when the block is absent)
 */
public record Recipe(Path file, String name, String crs, Survey survey, Path baseStation, Field field, GridBlock grid,
                     Path bathymetry, Path infrastructure, TargetBlock targets) {

    /**
     * The {@code survey} block.
     *
     * @param file     the survey CSV
     * @param columns  role (line, time, x, y, altitude, depth, latitude, longitude) to column name
     * @param sensors  the magnetometers, in array order (offsets: across positive to starboard, along
     *                 positive forward, metres)
     * @param tieLines names of the tie lines (the levelling datum)
     * @param lag      lag estimate and shift (the optional {@code lag} block; off without it)
     * @param microLevelling micro-levelling settings when the {@code micro_levelling} block turns it on
     * @param skipBadRows    rows that cannot be read are skipped with a warning instead of stopping the run
     *                       ({@code skip_bad_rows}, default false)
     */
    public record Survey(Path file, Map<String, String> columns, List<SensorSpec> sensors, List<String> tieLines,
                         LagOptions lag, Optional<MicroLevelling.Settings> microLevelling, boolean skipBadRows) {
    }

    /**
     * The {@code field} block.
     *
     * @param inclinationDeg inclination, degrees, positive down
     * @param declinationDeg declination, degrees clockwise from north
     * @param intensityNt    intensity, nT, or NaN when not given
     */
    public record Field(double inclinationDeg, double declinationDeg, double intensityNt) {
        public FieldDirection direction() {
            return new FieldDirection(inclinationDeg, declinationDeg);
        }
    }

    /**
     * The {@code grid} block.
     *
     * @param cellM     cell size, metres
     * @param tension   spline tension, 0 to 1
     * @param blankingM cells farther than this from any sample are blank, metres (NaN: the gridder's default)
     * @param tieLines  whether tie-line samples go into the grid as well as traverse samples (default no:
     *                  ties are the levelling datum, run across the traverse direction, and their residual
     *                  heading and levelling misfits would stripe the grid and its derivatives)
     */
    public record GridBlock(double cellM, double tension, double blankingM, boolean tieLines) {
    }

    /**
     * The optional {@code targets} block.
     *
     * @param thresholdSigma   picks must exceed this many robust noise deviations of the analytic signal
     * @param minSeparationM   smallest distance between two picks, metres
     * @param assetBufferM     distance within which a pick or feature matches charted infrastructure, metres
     */
    public record TargetBlock(double thresholdSigma, double minSeparationM, double assetBufferM) {
    }
}
