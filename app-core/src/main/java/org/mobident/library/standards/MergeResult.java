package org.mobident.library.standards;

import java.util.List;
import org.mobident.library.Library;

/**
 * The outcome of merging a fresh build into an existing library.
 *
 * @param library  the merged library
 * @param added    analytes that were new
 * @param pooled   analytes whose existing and fresh measurements were pooled
 * @param replaced analytes whose existing value had no n or SD and was replaced by the fresh one
 * @param warnings what an analyst should read
 */
public record MergeResult(Library library, List<String> added, List<String> pooled, List<String> replaced,
                          List<BuildWarning> warnings) {
    public MergeResult {
        added = List.copyOf(added);
        pooled = List.copyOf(pooled);
        replaced = List.copyOf(replaced);
        warnings = List.copyOf(warnings);
    }

    /** The warnings of one kind. */
    public List<BuildWarning> warnings(BuildWarning.Kind kind) {
        return warnings.stream().filter(w -> w.kind() == kind).toList();
    }
}
