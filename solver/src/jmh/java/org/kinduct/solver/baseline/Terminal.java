package org.kinduct.solver.baseline;

/** Which end of a wire (or which side of an open loop's gap) is at the higher potential. */
public enum Terminal {
    /** The first vertex is the + end. */
    FIRST,
    /** The last vertex is the + end (EMF &gt; 0 along the vertex order). */
    LAST,
    /** |EMF| is below the reporting threshold. */
    NONE;

    /** The + end for an EMF along the vertex order; NONE when |EMF| ≤ {@code noiseV}. */
    public static Terminal of(double emfV, double noiseV) {
        return emfV > noiseV ? LAST : emfV < -noiseV ? FIRST : NONE;
    }
}
