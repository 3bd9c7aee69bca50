package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CsvTableReaderTest {

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path p = dir.resolve("t.csv");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void readsColumnsByNameAndNumbersExactly() throws IOException {
        Path p = write("line,x,\"value\"\r\nL1,1.5,-2.25e1\n\nL2, 3 ,\"7\"\n");
        try (CsvTableReader r = CsvTableReader.open(p)) {
            assertThat(r.header()).containsExactly("line", "x", "value");
            int x = r.column("X");
            int v = r.column("value");
            assertThat(r.next()).isTrue();
            assertThat(r.text(0).toString()).isEqualTo("L1");
            assertThat(r.number(x)).isEqualTo(1.5);
            assertThat(r.number(v)).isEqualTo(-22.5);
            assertThat(r.lineNumber()).isEqualTo(2);
            assertThat(r.next()).isTrue();
            assertThat(r.lineNumber()).isEqualTo(4);
            assertThat(r.number(x)).isEqualTo(3.0);
            assertThat(r.number(v)).isEqualTo(7.0);
            assertThat(r.next()).isFalse();
        }
    }

    @Test
    void fastParserAgreesWithJdkToTheLastBit() throws IOException {
        // Reference: Double.parseDouble, the JDK's correctly rounded decimal conversion.
        Random rnd = new Random(7);
        StringBuilder sb = new StringBuilder("v\n");
        String[] samples = new String[5000];
        for (int i = 0; i < samples.length; i++) {
            double d = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(14) - 4);
            samples[i] = switch (i % 4) {
                case 0 -> String.format("%.3f", d);
                case 1 -> Double.toString(d);
                case 2 -> String.format("%.6e", d);
                default -> Long.toString((long) (d * 1e6));
            };
            sb.append(samples[i]).append('\n');
        }
        try (CsvTableReader r = CsvTableReader.open(write(sb.toString()))) {
            for (String s : samples) {
                assertThat(r.next()).isTrue();
                assertThat(r.number(0)).as(s).isEqualTo(Double.parseDouble(s));
            }
        }
    }

    @Test
    void errorsNameFileLineAndColumn() throws IOException {
        Path p = write("a,b\n1,2\n3,x7\n4\n");
        try (CsvTableReader r = CsvTableReader.open(p)) {
            assertThatThrownBy(() -> r.column("c")).hasMessageContaining("no column 'c'").hasMessageContaining("a, b");
            r.next();
            r.next();
            assertThatThrownBy(() -> r.number(1)).hasMessageContaining("line 3").hasMessageContaining("'b'")
                    .hasMessageContaining("x7");
            r.next();
            assertThatThrownBy(() -> r.number(1)).hasMessageContaining("line 4").hasMessageContaining("truncated");
        }
        assertThatThrownBy(() -> CsvTableReader.open(dir.resolve("none.csv"))).hasMessageContaining("no such file");
    }
}
