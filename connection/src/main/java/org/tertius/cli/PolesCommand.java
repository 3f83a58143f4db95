package org.tertius.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;

/** The poles and zeros of w in a region. */
public final class PolesCommand implements Command {
    static final String HEADER = "kind,z_re,z_im,sheet,lead_re,lead_im,err";

    final SolutionOptions solution = new SolutionOptions();
    String grid;
    String logStrip;
    Integer sheet;
    String format;
    Path out;

    @Override
    public String name() {
        return "poles";
    }

    @Override
    public String description() {
        return "List the poles and zeros of w in a region of one sheet (--grid) or a strip in log z (--log-strip):"
                + " CSV columns kind,z_re,z_im,sheet,lead_re,lead_im,err (lead: the residue at a pole, w' at a zero;"
                + " err: estimated error of the position), or JSON.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution);
    }

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--grid", "RE0:RE1:NX,IM0:IM1:NY",
                "the region; the counts set the resolution of the search (e.g. -10:10:201,-10:10:201)"));
        o.addOption(Opts.value("--log-strip", "LOGR0:LOGR1:NX,ARG0:ARG1:NY", Regions.LOG_STRIP_HELP));
        o.addOption(Opts.value("--sheet", "K", "sheet (default 0)"));
        o.addOption(Opts.value("--format", "csv|json", "output format (default csv)"));
        o.addOption(Opts.value("--out", "FILE", "output file (default standard output)"));
    }

    @Override
    public void read(Arguments a) {
        grid = a.text("--grid");
        logStrip = a.text("--log-strip");
        sheet = a.integer("--sheet", null);
        format = a.choice("--format", "csv", "json");
        out = a.path("--out");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter err) {
        String gridSpec = grid != null ? grid : (logStrip == null ? solution.file().get("grid") : null);
        if (gridSpec == null && logStrip == null) {
            throw new InvalidInputException("--grid", "a region is required: --grid RE0:RE1:NX,IM0:IM1:NY");
        }
        if (out != null) {
            OutputFile.checkWritable("--out", out);
        }
        Grid g = Regions.region(gridSpec, logStrip, solution.sheet(sheet));
        Painleve3Solution s = solution.solution();
        List<Singularity> found;
        try (Progress progress = new Progress("poles")) {
            RegionSolver.solve(s, g, RegionSettings.builder().progress(progress::update).build());
            found = PoleFinder.find(s, g);
        }
        String text = format.equals("csv") ? csv(found) : json(s, g, found);
        if (out == null) {
            stdout.print(text);
            stdout.flush();
        } else {
            OutputFile.writeWhole("--out", out, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
            err.println("tertius: wrote " + found.size() + " poles and zeros to " + out);
        }
        return 0;
    }

    static String csv(List<Singularity> found) {
        StringWriter sw = new StringWriter();
        PrintWriter w = new PrintWriter(sw);
        w.println(HEADER);
        for (Singularity s : found) {
            w.println(String.format(Locale.ROOT, "%s,%.17g,%.17g,%d,%.17g,%.17g,%.3e", s.kind().label(),
                    s.point().re(), s.point().im(), s.point().sheet(), s.lead().getReal(), s.lead().getImaginary(),
                    s.error()));
        }
        w.flush();
        return sw.toString();
    }

    static String json(Painleve3Solution sol, Grid g, List<Singularity> found) {
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = m.createObjectNode();
        root.put("equation", sol.equation().toString());
        if (g.logarithmic()) {
            root.put("log_strip", true);
        } else {
            root.put("sheet", g.sheet());
        }
        ArrayNode region = root.putArray("region");
        region.add(g.re0()).add(g.re1()).add(g.im0()).add(g.im1());
        ArrayNode list = root.putArray("singularities");
        for (Singularity s : found) {
            ObjectNode o = list.addObject();
            o.put("kind", s.kind().label());
            o.put("z_re", s.point().re());
            o.put("z_im", s.point().im());
            o.put("sheet", s.point().sheet());
            o.put("lead_re", s.lead().getReal());
            o.put("lead_im", s.lead().getImaginary());
            o.put("err", s.error());
        }
        try {
            return m.writeValueAsString(root) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
