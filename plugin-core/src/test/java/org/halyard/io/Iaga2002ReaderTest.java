package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.halyard.survey.BaseStation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class Iaga2002ReaderTest {

    @TempDir
    Path dir;

    static final double T0 = java.time.Instant.parse("2026-05-14T00:00:00Z").getEpochSecond();

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void readsXyzfOneMinute() throws IOException {
        // Layout per the IAGA-2002 format description: XYZF, 1-minute cadence.
        Path p = write("zzq20260514dmin.min", Iaga2002Fixture.file("XYZF", T0, 60, 120,
                t -> new double[] {17300.5, -480.25, 46200.75, 49200.0 + (t - T0) / 600}));
        BaseStation b = Iaga2002Reader.read(p);
        assertThat(b.size()).isEqualTo(120);
        assertThat(b.cadenceSeconds()).isEqualTo(60.0);
        assertThat(b.stationCode()).isEqualTo("ZZQ");
        assertThat(b.reported()).isEqualTo("XYZF");
        assertThat(b.time()[1] - b.time()[0]).isEqualTo(60.0);
        assertThat(b.time()[0]).isEqualTo(T0);
        assertThat(b.north()[5]).isEqualTo(17300.5);
        assertThat(b.east()[5]).isEqualTo(-480.25);
        assertThat(b.down()[5]).isEqualTo(46200.75);
        assertThat(b.total()[60]).isCloseTo(49206.0, within(1e-9));
        assertThat(b.totalComputed()).isFalse();
    }

    @Test
    void readsHdzfOneSecondWithDInMinutesOfArc() throws IOException {
        // IAGA-2002: D in minutes of arc; X = H cos D, Y = H sin D (definitions of the geomagnetic elements).
        double hh = 17310.0, dmin = -95.5;
        Path p = write("zzq20260514vsec.sec", Iaga2002Fixture.file("HDZF", T0, 1, 300,
                t -> new double[] {hh, dmin, 46200.0, 49337.12}));
        BaseStation b = Iaga2002Reader.read(p);
        assertThat(b.cadenceSeconds()).isEqualTo(1.0);
        double d = Math.toRadians(dmin / 60);
        assertThat(b.north()[10]).isCloseTo(hh * Math.cos(d), within(1e-9));
        assertThat(b.east()[10]).isCloseTo(hh * Math.sin(d), within(1e-9));
        assertThat(b.total()[10]).isEqualTo(49337.12);
    }

    @Test
    void missingAndNotRecordedMarkersBecomeNaNAndAbsentFIsComputed() throws IOException {
        // 99999.00 missing, 88888.00 not recorded (IAGA-2002 format description).
        Path p = write("m.sec", Iaga2002Fixture.file("XYZF", T0, 1, 10, t -> {
            int i = (int) (t - T0);
            return new double[] {i == 3 ? 99999.00 : 17000, 500, 46000, 88888.00};
        }));
        BaseStation b = Iaga2002Reader.read(p);
        assertThat(b.missingCount()).isEqualTo(1);
        assertThat(b.notRecordedCount()).isEqualTo(10);
        assertThat(b.north()[3]).isNaN();
        assertThat(b.totalComputed()).isTrue();
        assertThat(b.total()[0]).isCloseTo(Math.sqrt(17000.0 * 17000 + 500 * 500 + 46000.0 * 46000), within(1e-9));
        assertThat(b.total()[3]).isNaN();
    }

    @Test
    void badFilesNameTheLine() throws IOException {
        String good = Iaga2002Fixture.file("XYZF", T0, 60, 5, t -> new double[] {1, 2, 3, 4});
        String[] rows = good.split("\n");
        int firstData = 14; // 12 header records, 1 comment, 1 data header (0-based index of first data row)
        String truncated = good.replace(rows[firstData + 2], rows[firstData + 2].substring(0, 40));
        assertThatThrownBy(() -> Iaga2002Reader.read(write("t.min", truncated)))
                .hasMessageContaining("t.min").hasMessageContaining("line " + (firstData + 3)).hasMessageContaining("truncated");
        String letters = good.replace(rows[firstData + 1], rows[firstData + 1].replace("4.00", "4.x0"));
        assertThatThrownBy(() -> Iaga2002Reader.read(write("n.min", letters)))
                .hasMessageContaining("line " + (firstData + 2)).hasMessageContaining("column F");
        String back = good.replace(rows[firstData + 3], rows[firstData]);
        assertThatThrownBy(() -> Iaga2002Reader.read(write("b.min", back)))
                .hasMessageContaining("line " + (firstData + 4)).hasMessageContaining("backwards");
        assertThatThrownBy(() -> Iaga2002Reader.read(write("x.txt", "hello\n")))
                .hasMessageContaining("x.txt").hasMessageContaining("line 1");
    }
}
