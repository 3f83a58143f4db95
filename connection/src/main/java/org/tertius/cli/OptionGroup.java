package org.tertius.cli;

import org.apache.commons.cli.Options;

/** Options that belong together (and may be shared by several commands): declared once, read after parsing. */
interface OptionGroup {
    /** Adds the group's options (see {@link OptionKinds}). */
    void declare(Options options);

    /** Takes the group's values from the parsed arguments; an unusable value is a {@link UsageException}. */
    void read(Arguments arguments);
}
