package org.halyard.targets;

import java.util.List;

/**
 * How Euler deconvolution is run around a point.
 *
 * @param structuralIndex      N: 3 for a compact (dipole) source, 2 for a horizontal line source such as a
 *                             cable or pipe, 1 for a thin sheet edge (Reid et al. 1990); 0 (contact)
 *                             is refused because the background term vanishes
 * @param windowSizesM         square window sides to try, metres; the best accepted one wins
 * @param maxRelativeDepthError accept a solution only when sigma(depth) / depth is at most this
 * @param maxDistanceFactor    accept a solution only when its horizontal distance to the window centre is at
 *                             most this times the window side
 */
public record EulerOptions(double structuralIndex, List<Double> windowSizesM, double maxRelativeDepthError,
                           double maxDistanceFactor) {

    /** For discrete objects: N = 3, windows of 4, 6 and 8 m, 15% depth error, within half a window. */
    public static final EulerOptions DISCRETE = new EulerOptions(3, List.of(4.0, 6.0, 8.0), 0.15, 0.5);

    /** For cables and pipes: N = 2, otherwise as {@link #DISCRETE}. */
    public static final EulerOptions LINEAR = new EulerOptions(2, List.of(4.0, 6.0, 8.0), 0.15, 0.5);

    public EulerOptions {
        if (!(structuralIndex > 0 && structuralIndex <= 3)) {
            throw new IllegalArgumentException("structural index must be above 0 and at most 3 (the background term"
                    + " needs N > 0), got " + structuralIndex);
        }
        windowSizesM = List.copyOf(windowSizesM);
        if (windowSizesM.isEmpty() || windowSizesM.stream().anyMatch(w -> !(w > 0))) {
            throw new IllegalArgumentException("Euler window sizes must be positive metres, got " + windowSizesM);
        }
        if (!(maxRelativeDepthError > 0)) {
            throw new IllegalArgumentException("maximum relative depth error must be positive, got " + maxRelativeDepthError);
        }
        if (!(maxDistanceFactor > 0)) {
            throw new IllegalArgumentException("maximum distance factor must be positive, got " + maxDistanceFactor);
        }
    }

    /** The same options with another structural index. */
    public EulerOptions withStructuralIndex(double n) {
        return new EulerOptions(n, windowSizesM, maxRelativeDepthError, maxDistanceFactor);
    }
}
