package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.Test;

/**
 * The engine's fused path (row transforms of the data rows only, pad rows made in the wavenumber domain,
 * each column block transformed, filtered and transformed back in one go) against the plain definition
 * worked in double precision: plane removed, the grid padded in space with the same mirror-blend-taper
 * weights on both axes, the discrete Fourier transform by its defining sum, the response applied, the
 * inverse sum (DFT definitions: Bracewell, The Fourier Transform and Its Applications, ch. 18; upward
 * continuation exp(-|k| h): Blakely 1995, eq. 12.9). Agreement required: 1e-5 of the field's range, the
 * float arithmetic of the engine.
 */
class GridSpectrumDefinitionTest {

    private static final GridGeometry G = new GridGeometry(13, 9, 500, 900, 2, "EPSG:32631");

    private static Grid field() {
        return Grid.sample(G, (x, y) -> 40 * Math.exp(-((x - 512) * (x - 512) + (y - 893) * (y - 893)) / 30)
                + 0.5 * (x - 500) - 0.3 * (y - 900) + 3 * Math.sin(x / 3.0));
    }

    @Test
    void fusedPathMatchesTheDefinitionWorkedInDoublePrecision() {
        Grid grid = field();
        double height = 3;
        GridSpectrum spectrum = GridSpectrum.of(grid, Progress.NONE);
        Grid got = spectrum.filter(Responses.upward(height), Progress.NONE);
        double[] want = definition(grid, spectrum.paddedSize()[0], spectrum.paddedSize()[1], height);
        double[] range = grid.range();
        for (int i = 0; i < G.size(); i++) {
            assertThat(Math.abs(got.get(i) - want[i])).as("cell " + i).isLessThan(1e-5 * (range[1] - range[0]));
        }
    }

    @Test
    void consumingFilterGivesTheSameValuesAndOnlyOnce() {
        Grid grid = field();
        Grid kept = GridSpectrum.of(grid, Progress.NONE).filter(Responses.dx(), Progress.NONE);
        GridSpectrum once = GridSpectrum.of(grid, Progress.NONE);
        Grid consumed = once.filterConsuming(Responses.dx(), Progress.NONE);
        assertThat(consumed.toArray()).containsExactly(kept.toArray());
        assertThatThrownBy(() -> once.filter(Responses.dx(), Progress.NONE)).isInstanceOf(IllegalStateException.class);
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.EnumSource(value = FilterOperation.class, names = {"REDUCE_TO_POLE"},
            mode = org.junit.jupiter.params.provider.EnumSource.Mode.EXCLUDE)
    void singleUseBankGivesTheReusableBanksValuesAndRefusesASecondOperation(FilterOperation op) {
        FilterBank bank = FilterBank.once(field(), FilterSettings.defaults());
        Grid once = bank.apply(op, Progress.NONE);
        FilterBank reusable = new FilterBank(field(), FilterSettings.defaults());
        reusable.apply(FilterOperation.DX, Progress.NONE); // the reusable bank's caches in use
        assertThat(once.toArray()).as(op.cliName()).containsExactly(reusable.apply(op, Progress.NONE).toArray());
        assertThatThrownBy(() -> bank.apply(FilterOperation.DX, Progress.NONE)).isInstanceOf(IllegalStateException.class);
    }

    /** Upward continuation of {@code grid} by the defining sums, padded to {@code nc x nr}. */
    private static double[] definition(Grid grid, int nc, int nr, double height) {
        int w = G.columns(), h = G.rows();
        float[] rows = grid.toArray();
        LinearTrend t = LinearTrend.fit(G, rows, w);
        double[][] v = new double[nr][nc];
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                v[r][c] = rows[r * w + c] - t.at(G.x(c), G.y(r));
            }
        }
        PadExtension pc = PadExtension.of(w, nc), pr = PadExtension.of(h, nr);
        for (int r = 0; r < h; r++) {
            for (int j = 0; j < pc.size(); j++) {
                v[r][w + j] = pc.nearWeight[j] * v[r][pc.near[j]] + pc.farWeight[j] * v[r][pc.far[j]];
            }
        }
        for (int j = 0; j < pr.size(); j++) {
            for (int c = 0; c < nc; c++) {
                v[h + j][c] = pr.nearWeight[j] * v[pr.near[j]][c] + pr.farWeight[j] * v[pr.far[j]][c];
            }
        }
        double[] out = new double[w * h];
        double dkx = 2 * Math.PI / (nc * G.cellSize()), dky = 2 * Math.PI / (nr * G.cellSize());
        double[][] re = new double[nr][nc], im = new double[nr][nc];
        for (int q = 0; q < nr; q++) {
            for (int j = 0; j < nc; j++) {
                double sr = 0, si = 0;
                for (int r = 0; r < nr; r++) {
                    for (int c = 0; c < nc; c++) {
                        double ph = -2 * Math.PI * ((double) q * r / nr + (double) j * c / nc);
                        sr += v[r][c] * Math.cos(ph);
                        si += v[r][c] * Math.sin(ph);
                    }
                }
                int fq = q <= nr / 2 ? q : q - nr, fj = j <= nc / 2 ? j : j - nc;
                double k = Math.hypot(fj * dkx, fq * dky);
                re[q][j] = sr * Math.exp(-k * height);
                im[q][j] = si * Math.exp(-k * height);
            }
        }
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                double s = 0;
                for (int q = 0; q < nr; q++) {
                    for (int j = 0; j < nc; j++) {
                        double ph = 2 * Math.PI * ((double) q * r / nr + (double) j * c / nc);
                        s += re[q][j] * Math.cos(ph) - im[q][j] * Math.sin(ph);
                    }
                }
                out[r * w + c] = s / (nr * nc) + t.at(G.x(c), G.y(r));
            }
        }
        return out;
    }
}
