package org.tertius.cli;

import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.region.Grid;

/**
 * The region options shared by table, field and poles: a grid of one sheet ({@code --grid} with {@code --sheet}) or a
 * strip in log z over several sheets ({@code --log-strip}, for solutions with a branch point at 0).
 */
final class RegionOptions implements OptionGroup {
    static final String LOG_STRIP_HELP = "a strip in log z over several sheets: log|z| from LOGR0 to LOGR1 and the"
            + " argument from ARG0 to ARG1 (radians, continuous), e.g. -3:2.3:300,-9.43:9.43:600";

    private final String gridHelp;
    String grid;
    String logStrip;
    Integer sheet;

    RegionOptions() {
        this("a grid of one sheet");
    }

    RegionOptions(String gridHelp) {
        this.gridHelp = gridHelp;
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--grid", "RE0:RE1:NX,IM0:IM1:NY", gridHelp));
        o.addOption(OptionKinds.value("--log-strip", "LOGR0:LOGR1:NX,ARG0:ARG1:NY", LOG_STRIP_HELP));
        o.addOption(OptionKinds.value("--sheet", "K", "sheet of the points (default 0)"));
    }

    @Override
    public void read(Arguments a) {
        grid = a.text("--grid");
        logStrip = a.text("--log-strip");
        sheet = a.integer("--sheet", null);
    }

    /** Whether --grid or --log-strip was given. */
    boolean given() {
        return grid != null || logStrip != null;
    }

    /** --grid, or the problem file's grid when neither a line nor a strip was given. */
    String gridSpec(ProblemFile f, boolean lineGiven) {
        return grid != null ? grid : (!lineGiven && logStrip == null ? f.get("grid") : null);
    }

    /**
     * A note when the region holds the branch point z = 0 of a solution on a logarithmic surface (no value exists
     * there, and poles or zeros may accumulate at it), else null.
     */
    static String branchPointNote(Grid g, Coordinate coordinate) {
        if (!coordinate.hasSheets() || g.logarithmic() || !(g.re0() <= 0 && g.re1() >= 0 && g.im0() <= 0
                && g.im1() >= 0)) {
            return null;
        }
        String z = coordinate.name();
        return z + " = 0, the branch point, lies in the region: there is no value at it (a grid point there is left"
                + " as nan), and poles or zeros that accumulate at it are seen only as far as the path tree resolves them"
                + " (take a --log-strip to follow them towards 0)";
    }

    /** The region from the grid text (with the sheet) or --log-strip; exactly one may be given. */
    Grid grid(String gridSpec, int sheetNumber, Coordinate coordinate) {
        if (gridSpec != null && logStrip != null) {
            throw new InvalidInputException("--log-strip", "give either --grid or --log-strip, not both");
        }
        if (logStrip != null) {
            if (!coordinate.hasSheets()) {
                throw new InvalidInputException("--log-strip", "the solution is single-valued in " + coordinate.name()
                        + " (no branch point at 0); give a --grid");
            }
            Grid strip = Grid.parseLogStrip("--log-strip", logStrip);
            WorkLimits.checkRegion("--log-strip", strip);
            return strip;
        }
        coordinate.point("--sheet", 1, 0, sheetNumber);
        Grid g = Grid.parse("--grid", gridSpec, sheetNumber);
        WorkLimits.checkRegion("--grid", g);
        return g;
    }
}
