import java.io.BufferedWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Locale;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;

/**
 * Writes a synthetic survey for bench/survey.sh: N samples at 10 Hz, 2 m/s, two sensors 1.5 m apart,
 * north-south traverse lines 5 m apart with east-west tie lines, a smooth field, line offsets and a
 * diurnal; plus a 1-second IAGA-2002 base file covering it. With DIPOLES > 0, that many induced point
 * dipoles (0.2 to 6 A m2, 0 to 2 m below the seabed, uniform over the area; forward model of
 * org.halyard.model.Dipole) are added, and their truth goes to dipoles.csv. Fixed seed. Usage:
 * java -cp halyard.jar SurveyBenchData.java SAMPLES OUTDIR [DIPOLES]
 */
public class SurveyBenchData {
    public static void main(String[] a) throws Exception {
        long n = Long.parseLong(a[0]);
        Path out = Path.of(a[1]);
        Files.createDirectories(out);
        double lineLen = 4000, dt = 0.1, v = 2.0;
        int perLine = (int) (lineLen / (v * dt)) + 1;
        int ties = 10;
        long tieSamples = (long) ties * perLine;
        int traverse = (int) Math.max(1, (n - tieSamples) / perLine);
        double t0 = Instant.parse("2026-05-14T06:00:00Z").getEpochSecond();
        Random rnd = new Random(1);
        double t = t0;
        double width = (traverse - 1) * 5.0;
        List<Dipole> dipoles = dipoles(a.length > 2 ? Integer.parseInt(a[2]) : 0, width, lineLen, out);
        FieldDirection earth = new FieldDirection(69.4, -1.7);
        try (BufferedWriter w = Files.newBufferedWriter(out.resolve("lines.csv"))) {
            w.write("line,time,x,y,altitude,depth,mag_port,mag_stbd\n");
            StringBuilder sb = new StringBuilder(128);
            long written = 0;
            for (int l = 0; l < traverse + ties && written < n; l++) {
                boolean tie = l >= traverse;
                double off = tie ? 0 : 4 * (rnd.nextDouble() - 0.5);
                String id = tie ? String.format("T%02d", l - traverse + 1) : String.format("L%04d", l);
                int count = tie ? (int) (width / (v * dt)) + 1 : perLine;
                final double lineX = l * 5.0;
                List<Dipole> near = tie ? dipoles : dipoles.stream().filter(p -> Math.abs(p.x() - lineX) < 25).toList();
                for (int i = 0; i < count && written < n; i++, written++) {
                    double x, y, sx, sy;
                    if (tie) {
                        x = i * v * dt;
                        y = 200 + (l - traverse) * (lineLen - 400) / (ties - 1);
                        sx = 0; sy = -0.75;
                    } else {
                        x = l * 5.0;
                        y = (l % 2 == 0) ? i * v * dt : lineLen - i * v * dt;
                        sx = (l % 2 == 0) ? 0.75 : -0.75; sy = 0;
                    }
                    double d = diurnal(t - t0);
                    double alt = 2.0 + 0.3 * Math.sin(i / 500.0);
                    double fp = field(x - sx, y - sy) + d + off + anomaly(near, x - sx, y - sy, 25 - alt, earth);
                    double fs = field(x + sx, y + sy) + d + off + anomaly(near, x + sx, y + sy, 25 - alt, earth);
                    sb.setLength(0);
                    sb.append(id).append(',').append(Instant.ofEpochMilli(Math.round(t * 1000))).append(',');
                    fixed(sb, 431000 + x, 3).append(',');
                    fixed(sb, 6120000 + y, 3).append(',');
                    fixed(sb, alt, 2).append(",25.00,");
                    fixed(sb, fp, 3).append(',');
                    fixed(sb, fs, 3);
                    w.append(sb).append('\n');
                    t += dt;
                }
                t += 120;
            }
        }
        // base station, 1 s, XYZF, fictional code ZZQ
        try (BufferedWriter w = Files.newBufferedWriter(out.resolve("base.iaga2002"))) {
            String[][] h = {{"Format", "IAGA-2002"}, {"Source of Data", "Halyard benchmark"}, {"Station Name", "Quillan Skerry"},
                    {"IAGA Code", "ZZQ"}, {"Geodetic Latitude", "55.100"}, {"Geodetic Longitude", "3.200"}, {"Elevation", "12"},
                    {"Reported", "XYZF"}, {"Sensor Orientation", "XYZF"}, {"Digital Sampling", "0.1 second"},
                    {"Data Interval Type", "Filtered 1-Second"}, {"Data Type", "variation"}};
            for (String[] r : h) {
                w.write(String.format(Locale.ROOT, "%-69s|%n", String.format(Locale.ROOT, " %-23s%s", r[0], r[1])));
            }
            w.write(String.format(Locale.ROOT, "%-69s|%n", "DATE       TIME         DOY     ZZQX      ZZQY      ZZQZ      ZZQF"));
            for (double s = t0 - 600; s <= t + 600; s += 1) {
                var z = Instant.ofEpochSecond((long) s).atZone(ZoneOffset.UTC);
                w.write(String.format(Locale.ROOT, "%04d-%02d-%02d %02d:%02d:%02d.000 %03d   %10.2f%10.2f%10.2f%10.2f%n",
                        z.getYear(), z.getMonthValue(), z.getDayOfMonth(), z.getHour(), z.getMinute(), z.getSecond(),
                        z.getDayOfYear(), 17300.0, -500.0, 46000.0, 49100 + diurnal(s - t0)));
            }
        }
        System.out.println("traverse lines " + traverse + ", tie lines " + ties + ", survey hours " + (t - t0) / 3600);
    }

    /** v with d decimals, without String.format (which would dominate the generation time). */
    static StringBuilder fixed(StringBuilder sb, double v, int d) {
        long scale = d == 3 ? 1000 : 100;
        long q = Math.round(Math.abs(v) * scale);
        if (v < 0) {
            sb.append('-');
        }
        sb.append(q / scale).append('.');
        String f = Long.toString(q % scale + scale);
        return sb.append(f, 1, f.length());
    }

    /** Random induced dipoles in the local frame (x east, y north from the first line's start, z down from the sea surface). */
    static List<Dipole> dipoles(int count, double width, double length, Path out) throws Exception {
        List<Dipole> list = new ArrayList<>();
        if (count <= 0) {
            return list;
        }
        Random rnd = new Random(7);
        FieldDirection earth = new FieldDirection(69.4, -1.7);
        StringBuilder csv = new StringBuilder("id,x,y,depth_m,moment_am2\n");
        for (int k = 0; k < count; k++) {
            double x = rnd.nextDouble() * width, y = 100 + rnd.nextDouble() * (length - 200);
            double z = 25 + 2 * rnd.nextDouble(), m = 0.2 + 5.8 * rnd.nextDouble();
            list.add(Dipole.along(x, y, z, m, earth));
            csv.append(String.format(Locale.ROOT, "B%04d,%.2f,%.2f,%.2f,%.3f%n", k + 1, 431000 + x, 6120000 + y, z, m));
        }
        Files.writeString(out.resolve("dipoles.csv"), csv);
        return list;
    }

    /** Sum of the dipoles' total-field anomalies within 25 m horizontally, nT (sensor depth z, m, down). */
    static double anomaly(List<Dipole> dipoles, double x, double y, double z, FieldDirection f) {
        double sum = 0;
        for (Dipole p : dipoles) {
            if (Math.abs(p.x() - x) < 25 && Math.abs(p.y() - y) < 25) {
                sum += p.totalField(x, y, z, f);
            }
        }
        return sum;
    }

    static double diurnal(double s) {
        return 25 * Math.sin(2 * Math.PI * s / 43200) + 3 * Math.sin(2 * Math.PI * s / 1800);
    }

    static double field(double x, double y) {
        return 49000 + 30 * Math.sin(x / 80) * Math.cos(y / 120) + 0.01 * x;
    }
}
