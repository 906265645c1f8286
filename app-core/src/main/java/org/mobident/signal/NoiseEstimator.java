package org.mobident.signal;

import org.apache.commons.math3.special.Erf;

/**
 * Baseline noise of a trace.
 *
 * <p><b>Standard deviation.</b> For white noise of SD σ the first differences
 * {@code d_i = y_{i+1} − y_i} have SD σ√2, and slow drift or peaks that span many points
 * barely change them. The noise SD is therefore taken as
 * {@code σ = 1.4826 · MAD(d) / √2}, the median absolute deviation of the differences scaled to a
 * normal SD (Rousseeuw &amp; Croux, J. Am. Stat. Assoc. 88 (1993) 1273) and divided by √2. The
 * medians are found by selection in linear time. Correlated noise (a detector time constant)
 * has smaller differences than its SD, so σ is then a lower estimate.
 *
 * <p><b>Peak-to-peak noise.</b> Ph. Eur. 2.2.46 defines {@code S/N = 2H/h} with {@code h} the
 * range of the background noise over a window of 20 widths at half height (from memory). For
 * white Gaussian noise the expected range of {@code n} independent samples is {@code d₂(n)·σ},
 * with {@code d₂(n) = ∫ [1 − Φ(x)ⁿ − (1 − Φ(x))ⁿ] dx} (Tippett, Biometrika 17 (1925) 364), so
 * this package takes {@code h = d₂(n)·σ} with {@code n} the number of samples in that window:
 * about 5σ for 100 samples and 6.5σ for 1000.
 */
final class NoiseEstimator {

    private static final double SQRT2 = Math.sqrt(2.0);
    /** Integration range of d₂, in SDs: Φ(±10) differs from 0/1 by less than 1e-23. */
    private static final double RANGE_INTEGRAL_LIMIT = 10.0;
    /** Simpson intervals of the d₂ integral (even). */
    private static final int RANGE_INTEGRAL_STEPS = 800;

    private NoiseEstimator() {
    }

    /**
     * Robust noise SD from the first differences, σ = 1.4826 MAD(d)/√2.
     *
     * @param y values (not modified); at least 3
     */
    static double robustSd(double[] y) {
        int all = y.length - 1;
        if (all < 2) {
            return 0.0;
        }
        // Long traces: an evenly strided subset of the differences estimates the same MAD to within
        // about 3 % (its standard error for n = 2,048 normal values) at a fraction of the cost.
        int stride = Math.max(1, all / SignalLimits.SCALE_SAMPLE_CAP);
        int count = all / stride;
        double[] d = new double[count];
        for (int j = 0; j < count; j++) {
            int i = j * stride;
            d[j] = y[i + 1] - y[i];
        }
        double center = Selection.medianInPlace(d.clone(), count);
        for (int i = 0; i < count; i++) {
            d[i] = Math.abs(d[i] - center);
        }
        double mad = Selection.medianInPlace(d, count);
        return SignalLimits.MAD_TO_SD * mad / SQRT2;
    }

    /**
     * The spread of the values between their 0.1 % and 99.9 % quantiles (from an evenly strided
     * subset on long traces): the signal range without the pull of a few wild points.
     *
     * @param y values (not modified); at least 1
     */
    static double robustSpan(double[] y) {
        int stride = Math.max(1, y.length / SignalLimits.SCALE_SAMPLE_CAP);
        int count = y.length / stride;
        double[] s = new double[count];
        for (int j = 0; j < count; j++) {
            s[j] = y[j * stride];
        }
        int lowRank = (int) Math.floor(SignalLimits.SPAN_TAIL_FRACTION * (count - 1));
        int highRank = (count - 1) - lowRank;
        double low = Selection.select(s, 0, count - 1, lowRank);
        double high = Selection.select(s, 0, count - 1, highRank);
        return high - low;
    }

    /**
     * Robust SD of the first {@code count} entries of {@code work} (reordered): 1.4826 times their
     * median absolute deviation from their median (Rousseeuw &amp; Croux 1993). Selection only: linear.
     *
     * @param work  values, reordered and overwritten
     * @param count how many leading entries to use, at least 1
     */
    static double madSdInPlace(double[] work, int count) {
        double centre = Selection.medianInPlace(work, count);
        for (int i = 0; i < count; i++) {
            work[i] = Math.abs(work[i] - centre);
        }
        return SignalLimits.MAD_TO_SD * Selection.medianInPlace(work, count);
    }

    /**
     * Robust SD (1.4826 · MAD about the median) of the values themselves, not of their differences,
     * over the samples that are not {@code excluded}, from an evenly strided subset of at most
     * {@link SignalLimits#NOISE_SAMPLE_CAP} of them. On a baseline-corrected signal with the peaks
     * excluded this is the marginal SD of the noise, right for correlated noise too; 0 when fewer
     * than two samples remain. (When most samples are excluded, the stride leaves fewer than the cap.)
     *
     * @param v        values (not modified)
     * @param excluded samples to leave out, or null for none (not modified)
     */
    static double marginalSd(double[] v, boolean[] excluded) {
        return marginalSd(v, excluded, SignalLimits.NOISE_SAMPLE_CAP);
    }

    /**
     * {@link #marginalSd(double[], boolean[])} from the samples at an even stride that holds at most
     * {@code cap} of them (the excluded ones among them left out).
     */
    static double marginalSd(double[] v, boolean[] excluded, int cap) {
        int stride = Math.max(1, v.length / cap);
        double[] work = new double[(v.length + stride - 1) / stride];
        int m = 0;
        for (int i = 0; i < v.length; i += stride) {
            if (excluded == null || !excluded[i]) {
                work[m++] = v[i];
            }
        }
        return m < 2 ? 0.0 : madSdInPlace(work, m);
    }

    /**
     * Expected range of {@code n} independent standard normal values, d₂(n) (Tippett 1925):
     * exact (Simpson integration, {@link #integratedNormalRange}) up to
     * {@link RangeTable#EXACT_UP_TO}, beyond that interpolated linearly in ln n on a table of
     * exact values whose neighbours are 5 % apart in n (the error is below 1e-4: d₂ bends
     * slowly in ln n). The table is written out in {@link RangeTable} and never modified.
     *
     * @param n sample count ≥ 2
     */
    static double expectedNormalRange(long n) {
        if (n < 2) {
            throw new IllegalArgumentException("a range needs at least two samples, got " + n);
        }
        return RangeTable.value(n);
    }

    /**
     * d₂(n) by Simpson integration of {@code 1 − Φⁿ − (1 − Φ)ⁿ} over ±10 SD.
     *
     * @param n sample count ≥ 2 (a real number: the table interpolates between integers)
     */
    static double integratedNormalRange(double n) {
        double step = 2 * RANGE_INTEGRAL_LIMIT / RANGE_INTEGRAL_STEPS;
        double sum = 0;
        for (int i = 0; i <= RANGE_INTEGRAL_STEPS; i++) {
            double weight = (i == 0 || i == RANGE_INTEGRAL_STEPS) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += weight * (1.0 - Math.pow(NormalGrid.LOWER[i], n) - Math.pow(NormalGrid.UPPER[i], n));
        }
        return sum * step / 3;
    }

    /**
     * d₂(n) tabulated: every n up to {@link #EXACT_UP_TO}, then a geometric grid in n. The values are
     * those {@link #integratedNormalRange} gives (written out, not computed when the class loads: the
     * 407 integrals took about 40 ms of a single run's start, in code not yet compiled);
     * {@code NoiseEstimatorTest} recomputes every one of them and compares bit for bit.
     */
    static final class RangeTable {
        /** Sample counts up to this are tabulated one by one. */
        static final int EXACT_UP_TO = 128;
        /** Ratio of neighbouring sample counts in the geometric part. */
        static final double RATIO = 1.05;
        /** Largest count of the geometric part; beyond it d₂ is extrapolated linearly in ln n. */
        static final double LARGEST = 1e8;
        /** d₂(n) for n = 0 … {@link #EXACT_UP_TO} (0 and 1 unused). */
        static final double[] EXACT = {
                0.0, 0.0,
                1.1283791670955108, 1.692568750643269, 2.0587507460079273, 2.3259289472810374,
                2.5344127212229455, 2.7043567512138047, 2.847200612090558, 2.9700263244184733,
                3.077505461670345, 3.1728727038159987, 3.258455279743824, 3.3359803540982518,
                3.4067631081999554, 3.471826889882072, 3.5319827861095736, 3.5878839617653786,
                3.6400637579374453, 3.6889630232076462, 3.7349501195966357, 3.7783358298426157,
                3.8193846433628327, 3.8583234232850097, 3.895348148451354, 3.9306292195071144,
                3.9643156795226226, 3.9965386040131556, 4.027413848246527, 4.057044292095189,
                4.0855216883430225, 4.1129281952763845, 4.1393376558578145, 4.164816671940274,
                4.189425511536968, 4.2132188792079015, 4.236246573512985, 4.258554050746445,
                4.280182910470407, 4.301171315457521, 4.321554356350035, 4.341364369506935,
                4.360631215038829, 4.379382520842679, 4.397643897484962, 4.415439127996877,
                4.432790336001005, 4.449718135058967, 4.4662417616916015, 4.482379194158415,
                4.4981472587797, 4.513561725330263, 4.5286373928197285, 4.543388166794078,
                4.557827129140391, 4.571966601246849, 4.585818201259651, 4.599392896084033,
                4.612701048695298, 4.6257524612564485, 4.638556414478751, 4.651121703609635,
                4.663456671387526, 4.67556923826389, 4.687466930158877, 4.699156903987301,
                4.710645971165431, 4.721940619286658, 4.733047032133711, 4.743971108177746,
                4.754718477698968, 4.76529451864971, 4.775704371368762, 4.785952952244899,
                4.796044966418123, 4.805984919598319, 4.81577712907374, 4.825425733974762,
                4.834934704852281, 4.844307852624677, 4.85354883694261, 4.86266117401613,
                4.8716482439450095, 4.880513297589514, 4.889259463015446, 4.897889751544906,
                4.906407063440887, 4.914814193252194, 4.9231138348424155, 4.931308586125183,
                4.939400953525826, 4.947393356188226, 4.955288129944016, 4.96308753105999,
                4.970793739778338, 4.9784088636633, 4.985934940766774, 4.993373942624335,
                5.00072777709254, 5.007998291037427, 5.015187272883367, 5.022296455030957,
                5.029327516151819, 5.036282083367819, 5.043161734321463, 5.04996799914407,
                5.056702362327507, 5.063366264505217, 5.069961104147733, 5.076488239177433,
                5.082948988507235, 5.089344633507326, 5.09567641940407, 5.101945556614669,
                5.108153222021141, 5.1143005601868845, 5.120388684518834, 5.126418678378253,
                5.132391596142565, 5.138308464221086, 5.144170282026882, 5.14997802290691,
                5.155732635032832, 5.161435042254097, 5.167086144915632, 5.172686820641416,
                5.178237925086047, 5.183740292655525, 5.189194737198928
        };
        /** d₂(n) at n = {@link #EXACT_UP_TO} · {@link #RATIO}^k, k = 0 … ⌈ln(LARGEST/EXACT_UP_TO)/ln RATIO⌉. */
        static final double[] GRID = {
                5.189194737198928, 5.223019331088941, 5.256663293831151, 5.2901292399769835,
                5.323419728242818, 5.356537262962623, 5.389484295498885, 5.422263225612796,
                5.4548764027950725, 5.487326127558649, 5.519614652694116, 5.551744184489457,
                5.5837168839146925, 5.6155348677728405, 5.647200209818066, 5.678714941841954,
                5.710081054728985, 5.7413004994820405, 5.772375188218938, 5.803306995140773,
                5.834097757472943, 5.864749276379737, 5.895263317853139, 5.925641613576847,
                5.955885861765981, 5.985997727983466, 6.015978845933559, 6.04583081823338,
                6.075555217163096, 6.105153585395137, 6.1346274367035525, 6.163978256653535,
                6.193207503272249, 6.222316607701082, 6.251306974830071, 6.2801799839151515,
                6.308936989178413, 6.337579320392149, 6.366108283447107, 6.394525160905336,
                6.422831212538096, 6.451027675849455, 6.479115766585635, 6.507096679230945,
                6.534971587490312, 6.562741644759115, 6.590407984580543, 6.6179717210906475,
                6.645433949452035, 6.672795746275789, 6.700058170032524, 6.7272222614526855,
                6.754289043916326, 6.781259523832763, 6.808134691010506, 6.834915519017472,
                6.861602965532025, 6.8881979726849005, 6.914701467392536, 6.941114361681684,
                6.9674375530058805, 6.993671924553908, 7.019818345550367, 7.045877671548749,
                7.071850744717029, 7.097738394116263, 7.123541435972107, 7.149260673939565,
                7.174896899361258, 7.200450891519239, 7.225923417880622, 7.25131523433713,
                7.276627085438853, 7.301859704622237, 7.327013814432566, 7.3520901267409675,
                7.377089342956324, 7.402012154231883, 7.426859241667159, 7.45163127650468,
                7.476328920322366, 7.500952825221142, 7.525503634008129, 7.549981980375598,
                7.574388489075616, 7.59872377609068, 7.622988448800284, 7.647183106143729,
                7.671308338778986, 7.695364729238086, 7.719352852078765, 7.743273274032757,
                7.767126554150569, 7.79091324394308, 7.814633887519862, 7.838289021724395,
                7.861879176266164, 7.885404873849999, 7.908866630302167, 7.9322649546940385,
                7.955600349462732, 7.978873310529203, 8.00208432741376, 8.025233883348918,
                8.048322455389917, 8.071350514522747, 8.09431852576984, 8.117226948293542,
                8.14007623549721, 8.16286683512428, 8.185599189355173, 8.208273734902058,
                8.230890903101704, 8.253451120006291, 8.275954806472404, 8.298402378248007,
                8.32079424605773, 8.343130815686285, 8.365412488060258, 8.387639659328055,
                8.409812720938374, 8.431932059716873, 8.453998057941428, 8.476011093415792,
                8.497971539541766, 8.519879765389858, 8.541736135768609, 8.5635410112925,
                8.585294748448364, 8.606997699660695, 8.628650213355582, 8.650252634023198,
                8.671805302279298, 8.693308554925474, 8.714762725008041, 8.736168141876002,
                8.757525131237722, 8.778834015216646, 8.800095112405787, 8.821308737921308,
                8.842475203455013, 8.863594817325778, 8.884667884530153, 8.905694706791857,
                8.926675582610455, 8.947610807308982, 8.968500673080948, 8.989345469036001,
                9.010145481245239, 9.0309009927854, 9.051612283782271, 9.072279631453393,
                9.092903310149794, 9.113483591397218, 9.134020743936407, 9.154515033762758,
                9.174966724165152, 9.195376075764202, 9.215743346549774, 9.236068791917853,
                9.25635266470662, 9.27659521523215, 9.296796691323303, 9.316957338355897,
                9.337077399286612, 9.35715711468594, 9.377196722770842, 9.397196459436648,
                9.417156558288497, 9.437077250672276, 9.456958765704872, 9.476801330304074,
                9.49660516921791, 9.516370505053379, 9.536097558304922, 9.555786547382151,
                9.57543768863736, 9.595051196392381, 9.61462728296509, 9.634166158695423,
                9.653668031971067, 9.67313310925256, 9.692561595098143, 9.711953692188095,
                9.731309601348634, 9.750629521575666, 9.769913650057774, 9.789162182199254,
                9.808375311642388, 9.827553230289706, 9.846696128325524, 9.865804194237503,
                9.884877614837695, 9.903916575283164, 9.92292125909646, 9.94189184818565,
                9.96082852286411, 9.979731461869953, 9.998600842385207, 10.01743684005456,
                10.036239629004047, 10.05500938185927, 10.073746269763362, 10.092450462394746,
                10.11112212798452, 10.129761433333725, 10.148368543830117, 10.166943623465041,
                10.185486834849645, 10.203998339231122, 10.222478296508656, 10.240926865249051,
                10.259344202702268, 10.277730464816562, 10.296085806253464, 10.314410380402673,
                10.332704339396477, 10.350967834124264, 10.369201014246444, 10.387404028208602,
                10.405577023255052, 10.42372014544245, 10.44183353965312, 10.459917349608252,
                10.477971717880706, 10.495996785907948, 10.513992694004523, 10.53195958137456,
                10.549897586123931, 10.567806845272335, 10.585687494765219, 10.60353966948545,
                10.621363503264964, 10.639159128896058, 10.656926678142737, 10.674666281751724,
                10.692378069463429, 10.71006217002274, 10.727718711189643, 10.74534781974974,
                10.762949621524527, 10.780524241381697, 10.798071803245122, 10.81559243010487,
                10.833086244026921, 10.850553366162892, 10.867993916759561, 10.885408015168231,
                10.902795779854133, 10.920157328405422, 10.937492777542374, 10.954802243126215,
                10.972085840167926, 10.98934368283701, 11.006575884469948, 11.023782557578771,
                11.040963813859385, 11.0581197641997, 11.075250518687971, 11.09235618662069,
                11.109436876510522, 11.12649269609421, 11.143523752340192, 11.16053015145635,
                11.177511998897474, 11.194469399372636, 11.211402456852753, 11.228311274577537,
                11.245195955062897, 11.262056600107911, 11.278893310801799, 11.295706187530818,
                11.31249532998509, 11.32926083716538, 11.346002807389558, 11.362721338299401,
                11.379416526866889, 11.396088469400631, 11.412737261552268, 11.429362998322654
        };

        private RangeTable() {
        }

        static double value(long n) {
            if (n <= EXACT_UP_TO) {
                return EXACT[(int) n];
            }
            double x = Math.log((double) n / EXACT_UP_TO) / Math.log(RATIO);
            int k = Math.min((int) Math.floor(x), GRID.length - 2);
            double f = x - k;
            return GRID[k] + f * (GRID[k + 1] - GRID[k]);
        }
    }

    /**
     * Φ(x) and 1 − Φ(x) at the Simpson nodes of the d₂ integral, computed once: the nodes do not
     * depend on n, so each call only raises them to the power n. Never modified after class set-up.
     */
    private static final class NormalGrid {
        static final double[] LOWER = new double[RANGE_INTEGRAL_STEPS + 1];
        static final double[] UPPER = new double[RANGE_INTEGRAL_STEPS + 1];

        static {
            double a = -RANGE_INTEGRAL_LIMIT;
            double step = 2 * RANGE_INTEGRAL_LIMIT / RANGE_INTEGRAL_STEPS;
            for (int i = 0; i <= RANGE_INTEGRAL_STEPS; i++) {
                double x = a + i * step;
                // Φ(x) and 1 − Φ(x) each from erfc, to keep precision in both tails
                UPPER[i] = 0.5 * Erf.erfc(x / SQRT2);
                LOWER[i] = 0.5 * Erf.erfc(-x / SQRT2);
            }
        }

        private NormalGrid() {
        }
    }
}
