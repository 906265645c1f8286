package org.mobident.assess;

/**
 * A count out of a count, such as "34 of 36 calls were right".
 *
 * @param count  how many met the condition
 * @param of     how many there were
 */
public record Ratio(int count, int of) {
    public Ratio {
        if (count < 0 || of < 0 || count > of) {
            throw new IllegalArgumentException("a ratio needs 0 <= count <= of, got " + count + " of " + of);
        }
    }

    /** The fraction count / of, NaN when there was nothing to count. */
    public double value() {
        return of == 0 ? Double.NaN : (double) count / of;
    }
}
