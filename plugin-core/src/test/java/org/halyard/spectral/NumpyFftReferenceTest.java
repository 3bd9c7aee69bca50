package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.halyard.grid.Progress;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * The engine's real 2-D transform against NumPy's {@code numpy.fft.rfft2} on the same random arrays
 * (fixed seed), over power-of-two, 2-3-5-7-smooth and prime row counts (JTransforms' reported trouble
 * spots, STACK.md). Agreement required: 1e-5 of the largest coefficient.
 */
@Tag("external")
class NumpyFftReferenceTest {

    @TempDir
    Path dir;

    @ParameterizedTest
    @CsvSource({"8, 6", "64, 64", "30, 42", "97, 210", "126, 100", "127, 360", "250, 96"})
    void forwardTransformMatchesNumpy(int nr, int nc) throws IOException {
        ExternalTools.require(ExternalTools.PYTHON);
        Random rnd = new Random(nr * 1000L + nc);
        int stride = nc + 2;
        float[] s = new float[nr * stride];
        ByteBuffer in = ByteBuffer.allocate(4 * nr * nc).order(ByteOrder.LITTLE_ENDIAN);
        for (int r = 0; r < nr; r++) {
            for (int c = 0; c < nc; c++) {
                float v = (float) rnd.nextGaussian();
                s[r * stride + c] = v;
                in.putFloat(v);
            }
        }
        Path a = dir.resolve("a.f32"), b = dir.resolve("b.c64");
        Files.write(a, in.array());
        ExternalTools.python("import numpy as np, sys\n"
                + "x = np.fromfile(sys.argv[1], '<f4').reshape(int(sys.argv[3]), int(sys.argv[4])).astype(np.float64)\n"
                + "np.fft.rfft2(x).astype('<c8').tofile(sys.argv[2])\n", dir, a.toString(), b.toString(),
                Integer.toString(nr), Integer.toString(nc));
        GridSpectrum.forward(s, nr, nc, Progress.NONE);
        ByteBuffer ref = ByteBuffer.wrap(Files.readAllBytes(b)).order(ByteOrder.LITTLE_ENDIAN);
        int half = nc / 2 + 1;
        double maxAbs = 0, maxErr = 0;
        for (int q = 0; q < nr; q++) {
            for (int k = 0; k < half; k++) {
                double re = ref.getFloat(), im = ref.getFloat();
                maxAbs = Math.max(maxAbs, Math.hypot(re, im));
                maxErr = Math.max(maxErr, Math.hypot(re - s[q * stride + 2 * k], im - s[q * stride + 2 * k + 1]));
            }
        }
        assertThat(maxErr / maxAbs).as(nr + " x " + nc).isLessThan(1e-5);
    }
}
