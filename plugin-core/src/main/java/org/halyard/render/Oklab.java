package org.halyard.render;

/**
 * Conversions between sRGB and the OKLab perceptual colour space.
 *
 * <p><b>Algorithm:</b> B. Ottosson (2020), "A perceptual color space for image processing"
 * (bottosson.github.io/posts/oklab): linear sRGB to LMS by a 3 x 3 matrix, a cube root, then a second
 * matrix to (L, a, b). sRGB transfer function from IEC 61966-2-1. Euclidean distance in OKLab approximates
 * perceived colour difference, which is what makes a ramp built in it perceptually even.
 *
 * <p><b>Accuracy:</b> double precision; a round trip through 8-bit sRGB is exact to the byte.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class Oklab {

    private Oklab() {
    }

    /**
     * OKLab {@code {L, a, b}} to a packed opaque ARGB int, clipping each channel to [0, 1] in linear
     * light.
     *
     * @param lab L (0 black to 1 white), a (green to red), b (blue to yellow)
     */
    public static int toArgb(double[] lab) {
        double[] rgb = toLinearRgb(lab);
        int r = encode(rgb[0]), g = encode(rgb[1]), bl = encode(rgb[2]);
        return 0xFF000000 | (r << 16) | (g << 8) | bl;
    }

    /** OKLab {@code {L, a, b}} to unclipped linear sRGB {@code {r, g, b}} (in gamut when all in [0, 1]). */
    public static double[] toLinearRgb(double[] lab) {
        double l = lab[0] + 0.3963377774 * lab[1] + 0.2158037573 * lab[2];
        double m = lab[0] - 0.1055613458 * lab[1] - 0.0638541728 * lab[2];
        double s = lab[0] - 0.0894841775 * lab[1] - 1.2914855480 * lab[2];
        l = l * l * l;
        m = m * m * m;
        s = s * s * s;
        return new double[] {
            4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
            -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
            -0.0041960863 * l - 0.7034186147 * m + 1.7076147010 * s};
    }

    /** A packed ARGB int (alpha ignored) to OKLab {@code {L, a, b}}. */
    public static double[] fromArgb(int argb) {
        double r = decode((argb >> 16) & 0xFF), g = decode((argb >> 8) & 0xFF), b = decode(argb & 0xFF);
        double l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
        double m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
        double s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
        return new double[] {
            0.2104542553 * l + 0.7936177850 * m - 0.0040720468 * s,
            1.9779984951 * l - 2.4285922050 * m + 0.4505937099 * s,
            0.0259040371 * l + 0.7827717662 * m - 0.8086757660 * s};
    }

    /** OKLCh (lightness, chroma, hue in degrees counter-clockwise from the +a axis) to OKLab. */
    public static double[] fromLch(double lightness, double chroma, double hueDeg) {
        double h = Math.toRadians(hueDeg);
        return new double[] {lightness, chroma * Math.cos(h), chroma * Math.sin(h)};
    }

    private static int encode(double linear) {
        double c = Math.max(0, Math.min(1, linear));
        double v = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
        return (int) Math.round(v * 255);
    }

    private static double decode(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
