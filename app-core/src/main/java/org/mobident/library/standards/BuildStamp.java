package org.mobident.library.standards;

import java.time.Instant;

/**
 * When and by what a library was built; written into its notes. Passed in rather than read from
 * the clock so that builds are reproducible.
 *
 * @param builtAt     the build date (kept to the second)
 * @param toolVersion name and version of the building tool, e.g. "mobident 0.1.0"
 */
public record BuildStamp(Instant builtAt, String toolVersion) {
    public BuildStamp {
        if (builtAt == null) {
            throw new IllegalArgumentException("builtAt is required");
        }
        builtAt = builtAt.truncatedTo(java.time.temporal.ChronoUnit.SECONDS); // a person reads it
        if (toolVersion == null || toolVersion.isBlank()) {
            throw new IllegalArgumentException("toolVersion is required");
        }
    }
}
