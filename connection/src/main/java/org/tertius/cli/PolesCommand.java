package org.tertius.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;

/** The poles and zeros of a solution's first value (w, or q of a hierarchy member) in a region. */
public final class PolesCommand implements Command {
    final SolutionOptions solution = new SolutionOptions();
    final RegionOptions region = new RegionOptions(
            "the region; the counts set the resolution of the search (e.g. -10:10:201,-10:10:201)");
    String format;
    Path out;

    @Override
    public String name() {
        return "poles";
    }

    @Override
    public String description() {
        return "List the poles and zeros of w (of q for a hierarchy member) in a region of one sheet (--grid) or a"
                + " strip in log z (--log-strip): CSV columns kind,z_re,z_im,sheet,lead_re,lead_im,err (lead: the"
                + " residue at a pole, the derivative at a zero; err: estimated error of the position), or JSON.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, region);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--format", "csv|json", "output format (default csv)"));
        o.addOption(OptionKinds.value("--out", "FILE", "output file (default standard output)"));
    }

    @Override
    public void read(Arguments a) {
        format = a.choice("--format", "csv", "json");
        out = a.path("--out");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter err) {
        String gridSpec = region.gridSpec(solution.file(), false);
        if (gridSpec == null && region.logStrip == null) {
            throw new InvalidInputException("--grid", "a region is required: --grid RE0:RE1:NX,IM0:IM1:NY");
        }
        if (out != null) {
            OutputFile.checkWritable("--out", out);
        }
        ComputedSolution s = solution.solution();
        solution.notes().forEach(n -> err.println("tertius: " + n));
        if (solution.special.built() != null) {
            // a closed form or a Backlund image has no path tree: the engine started from its values has one
            s = solution.special.built().integrated(solution.solver.settings());
            err.println("tertius: poles and zeros read off the engine " + s.methodDescription());
        }
        Grid g = region.grid(gridSpec, solution.sheet(region.sheet), s.coordinate());
        String note = RegionOptions.branchPointNote(g, s.coordinate());
        if (note != null) {
            err.println("tertius: " + note);
        }
        List<Singularity> found;
        try (Progress progress = new Progress("poles")) {
            GridResult r = RegionSolver.solve(s, g, RegionSettings.builder().progress(progress::update).build());
            found = PoleFinder.find(r);
        }
        String text = format.equals("csv") ? SingularityRows.csv(s.coordinate().name(), found)
                : SingularityRows.json(s, g, found);
        if (out == null) {
            stdout.print(text);
            stdout.flush();
        } else {
            OutputFile.writeWhole("--out", out, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
            err.println("tertius: wrote " + found.size() + " poles and zeros to " + out);
        }
        return 0;
    }
}
