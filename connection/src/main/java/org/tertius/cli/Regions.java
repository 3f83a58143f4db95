package org.tertius.cli;

import org.tertius.core.InvalidInputException;
import org.tertius.core.region.Grid;

/** The region options shared by table, field and poles: a grid of one sheet or a strip in log z. */
final class Regions {
    static final String LOG_STRIP_HELP = "a strip in log z over several sheets: log|z| from LOGR0 to LOGR1 and the"
            + " argument from ARG0 to ARG1 (radians, continuous), e.g. -3:2.3:300,-9.43:9.43:600";

    private Regions() {
    }

    /** The region from --grid (with --sheet) or --log-strip; exactly one may be given. */
    static Grid region(String grid, String logStrip, int sheet) {
        if (grid != null && logStrip != null) {
            throw new InvalidInputException("--log-strip", "give either --grid or --log-strip, not both");
        }
        if (logStrip != null) {
            return Grid.parseLogStrip("--log-strip", logStrip);
        }
        return Grid.parse("--grid", grid, sheet);
    }
}
