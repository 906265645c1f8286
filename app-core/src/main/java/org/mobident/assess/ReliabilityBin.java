package org.mobident.assess;

/**
 * One confidence bin of a reliability table.
 *
 * @param lower          lower edge of the bin (included)
 * @param upper          upper edge (excluded, except 1 for the last bin)
 * @param count          how many predictions fell in it
 * @param meanConfidence their mean confidence (NaN when the bin is empty)
 * @param accuracy       the fraction of them that were right (NaN when empty)
 */
public record ReliabilityBin(double lower, double upper, int count, double meanConfidence, double accuracy) {
}
