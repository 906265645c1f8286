package org.mobident.recheck;

import java.util.ArrayList;
import java.util.List;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Which analytes of a library the mobility model can carry to another buffer, and what to do
 * about the others, said once per analyte (for {@code library check}, {@code predict} and
 * {@code recheck}).
 *
 * @param own       analytes with their own pKa values and limiting mobilities
 * @param reference analytes modelled with the reference library's data (by name)
 * @param strong    analytes known only by their charge: treated as strong ions
 * @param none      analytes without model data: a pH change is not accounted for
 * @param problems  one line per analyte whose own pka/limiting_mobility could not be used
 */
public record ModelCoverage(List<String> own, List<String> reference, List<String> strong, List<String> none,
                            List<String> problems) {

    /** How to give an analyte model data, in words for a terminal. */
    public static final String HOW_TO_FIX = "give its charge, pka and limiting_mobility (space-separated, one "
            + "limiting mobility per form, most protonated form first, 0 for a neutral form) in the standards sheet "
            + "and rebuild, or in the library's columns of the same names; or name it as the reference library "
            + "does and pass --reference";

    public ModelCoverage {
        own = List.copyOf(own);
        reference = List.copyOf(reference);
        strong = List.copyOf(strong);
        none = List.copyOf(none);
        problems = List.copyOf(problems);
    }

    /** The coverage of every entry of {@code library} by {@code transfer}'s data. */
    public static ModelCoverage of(Library library, BufferTransfer transfer) {
        List<String> own = new ArrayList<>();
        List<String> reference = new ArrayList<>();
        List<String> strong = new ArrayList<>();
        List<String> none = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (LibraryEntry e : library.entries()) {
            BufferTransfer.Coverage c = transfer.coverage(e, library.sourceFile());
            switch (c.basis()) {
                case ENTRY_MODEL -> own.add(e.name());
                case REFERENCE_MODEL -> reference.add(e.name());
                case CHARGE_ONLY -> strong.add(e.name());
                case NO_MODEL -> none.add(e.name());
                default -> throw new IllegalStateException("unknown basis " + c.basis());
            }
            if (c.problem() != null) {
                problems.add(e.name() + ": " + c.problem());
            }
        }
        return new ModelCoverage(own, reference, strong, none, problems);
    }

    /** True when every analyte can be modelled across a pH change (none without data, no problems). */
    public boolean complete() {
        return none.isEmpty() && problems.isEmpty();
    }

    /**
     * The lines for a person: counts per basis, then the analytes that cannot be predicted and the
     * fix, once; the analytes taken as strong ions; the problems. No line when a list is empty.
     */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        int total = own.size() + reference.size() + strong.size() + none.size();
        out.add(String.format(java.util.Locale.ROOT, "Prediction in another buffer: %d of %d analyte(s) modelled "
                        + "(%d with their own pKa data, %d with reference data, %d as strong ions), %d without model data.",
                own.size() + reference.size() + strong.size(), total, own.size(), reference.size(), strong.size(),
                none.size()));
        if (!none.isEmpty()) {
            out.add("  Cannot be predicted across a pH change (only temperature and ionic strength are carried over): "
                    + String.join(", ", none) + ".");
            out.add("  To fix: for each, " + HOW_TO_FIX + ".");
        }
        if (!strong.isEmpty()) {
            out.add("  Taken as strong ions (charge only, no pKa): " + String.join(", ", strong)
                    + "; if one is a weak acid or base, give its pka and limiting_mobility.");
        }
        for (String p : problems) {
            out.add("  " + p);
        }
        return out;
    }
}
