package org.mobident.signal;

/**
 * Order statistics by selection (Hoare's FIND, Commun. ACM 4 (1961) 321), expected time
 * linear in the number of values, with a median-of-three pivot. No full sort.
 */
public final class Selection {

    private Selection() {
    }

    /** Median of {@code values} (not modified); for an even count the mean of the two middle values. */
    public static double median(double[] values) {
        return medianInPlace(values.clone(), values.length);
    }

    /**
     * Median of about {@code samples} evenly strided values of {@code values[from, from + length)}
     * (all of them when there are fewer): a level, read cheaply off a long stretch (not modified).
     */
    public static double stridedMedian(double[] values, int from, int length, int samples) {
        int stride = Math.max(1, length / Math.max(1, samples));
        double[] work = new double[(length + stride - 1) / stride];
        int m = 0;
        for (int i = from; i < from + length; i += stride) {
            work[m++] = values[i];
        }
        return medianInPlace(work, m);
    }

    /**
     * Median of the first {@code count} entries of {@code work}, which is reordered.
     *
     * @param work  values, reordered in place
     * @param count how many leading entries to use, at least 1
     */
    public static double medianInPlace(double[] work, int count) {
        if (count < 1) {
            throw new IllegalArgumentException("median of no values");
        }
        int upper = count / 2;
        double hi = select(work, 0, count - 1, upper);
        if (count % 2 == 1) {
            return hi;
        }
        // after selection every entry left of 'upper' is <= hi: the lower middle is their maximum
        double lo = work[0];
        for (int i = 1; i < upper; i++) {
            lo = Math.max(lo, work[i]);
        }
        return 0.5 * (lo + hi);
    }

    /** The k-th smallest (0-based) of work[left..right], which is reordered around it. */
    static double select(double[] work, int left, int right, int k) {
        int lo = left;
        int hi = right;
        while (hi > lo) {
            int mid = (lo + hi) >>> 1;
            // median of three to the middle, as pivot
            if (work[mid] < work[lo]) {
                swap(work, mid, lo);
            }
            if (work[hi] < work[lo]) {
                swap(work, hi, lo);
            }
            if (work[hi] < work[mid]) {
                swap(work, hi, mid);
            }
            double pivot = work[mid];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (work[i] < pivot) {
                    i++;
                }
                while (work[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    swap(work, i, j);
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return work[k];
            }
        }
        return work[k];
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
