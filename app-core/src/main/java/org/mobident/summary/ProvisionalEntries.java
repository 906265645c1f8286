package org.mobident.summary;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Recurring unknowns of a batch as provisional library entries, for a lab that wants to follow
 * them from run to run before it knows what they are: each group becomes an entry named as the
 * group ({@code unknown-1}, …, or the next free number when the library already holds that name),
 * with the group's mean mobility at the library temperature after the runs' scale corrections, the
 * SD of its members, the number of runs as n, the group's buffer and a source that says where it
 * came from. Charge, pKa and window are left empty: nothing is known about the substance yet.
 */
public final class ProvisionalEntries {

    private ProvisionalEntries() {
    }

    /**
     * The groups as a library of provisional entries.
     *
     * @param groups  recurring unknowns ({@link RecurringUnknowns#of})
     * @param library the library the batch was matched against (for names and temperatures)
     * @param batch   how the batch is named in each entry's source (e.g. the run sheet)
     */
    public static Library of(List<RecurringUnknowns.Group> groups, Library library, String batch) {
        Set<String> taken = new HashSet<>();
        for (LibraryEntry e : library.entries()) {
            taken.add(e.name().toLowerCase(Locale.ROOT));
        }
        List<LibraryEntry> entries = new ArrayList<>(groups.size());
        int next = 1;
        for (RecurringUnknowns.Group g : groups) {
            String name = g.name();
            while (taken.contains(name.toLowerCase(Locale.ROOT))) {
                name = RecurringUnknowns.NAME_PREFIX + next++;
            }
            taken.add(name.toLowerCase(Locale.ROOT));
            String source = String.format(Locale.ROOT, "provisional: unassigned in %d of %d runs of %s%s",
                    g.runs().size(), g.runsInBuffer(), batch, g.buffer() == null ? "" : " (buffer " + g.buffer() + ")");
            entries.add(new LibraryEntry(name, rounded(g.meanMobility()), rounded(g.mobilitySd()), g.runs().size(), 0,
                    Double.NaN,
                    List.of(), List.of(), g.buffer(), Double.NaN, Double.NaN, temperatureOf(library, g.buffer()),
                    source, false, Double.NaN));
        }
        return new Library(entries, null, List.of("provisional entries of recurring unknowns: check them before "
                + "adding them to your library"));
    }

    /** A mobility to the thousandth of a unit: far below its uncertainty, and readable in the file. */
    private static double rounded(double mobility) {
        return Double.isFinite(mobility) ? Math.round(mobility * MOBILITY_SCALE) / MOBILITY_SCALE : mobility;
    }

    private static final double MOBILITY_SCALE = 1000.0;

    /** The temperature the library's mobilities of a buffer refer to (NaN, read as 25 °C, when none is stated). */
    private static double temperatureOf(Library library, String buffer) {
        for (LibraryEntry e : library.entries()) {
            boolean sameBuffer = buffer == null ? e.buffer() == null : buffer.equals(e.buffer());
            if ((sameBuffer || e.buffer() == null) && Double.isFinite(e.temperatureC())) {
                return e.temperatureC();
            }
        }
        return Double.NaN;
    }
}
