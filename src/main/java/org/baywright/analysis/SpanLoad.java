package org.baywright.analysis;

/**
 * A load on a simply supported span, in canonical SI units: positions in metres measured from the
 * left support, forces in newtons, intensities in N/m. Downward load is positive.
 *
 * <p>A load knows nothing of the span it sits on; {@link SimpleSpan#of} checks that it lies inside.
 */
public sealed interface SpanLoad permits PointLoad, DistributedLoad {

    /**
     * The same load with every force or intensity multiplied by {@code factor} (positions unchanged).
     *
     * @param factor a finite number; zero and negative factors are allowed
     * @throws IllegalArgumentException if {@code factor} is not finite
     */
    SpanLoad scaled(double factor);

    /** The resultant of this load, N (downward positive). */
    double total();

}
