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
import java.util.concurrent.Callable;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** The poles and zeros of w in a region. */
@Command(name = "poles", mixinStandardHelpOptions = true,
        description = "List the poles and zeros of w in a region of one sheet (--grid) or a strip in log z (--log-strip): CSV columns kind,z_re,z_im,sheet,"
                + "lead_re,lead_im,err (lead: the residue at a pole, w' at a zero; err: estimated error of the"
                + " position), or JSON.")
public final class PolesCommand implements Callable<Integer> {
    static final String HEADER = "kind,z_re,z_im,sheet,lead_re,lead_im,err";

    @Spec
    CommandSpec spec;
    @Mixin
    SolutionOptions solution = new SolutionOptions();
    @Option(names = "--grid", paramLabel = "RE0:RE1:NX,IM0:IM1:NY",
            description = "the region; the counts set the resolution of the search (e.g. -10:10:201,-10:10:201)")
    String grid;
    @Option(names = "--log-strip", paramLabel = "LOGR0:LOGR1:NX,ARG0:ARG1:NY", description = Regions.LOG_STRIP_HELP)
    String logStrip;
    @Option(names = "--sheet", paramLabel = "K", description = "sheet (default 0)")
    Integer sheet;
    @Option(names = "--format", paramLabel = "csv|json", description = "output format (default csv)")
    String format = "csv";
    @Option(names = "--out", paramLabel = "FILE", description = "output file (default standard output)")
    Path out;

    @Override
    public Integer call() {
        String gridSpec = grid != null ? grid : (logStrip == null ? solution.file().get("grid") : null);
        if (gridSpec == null && logStrip == null) {
            throw new InvalidInputException("--grid", "a region is required: --grid RE0:RE1:NX,IM0:IM1:NY");
        }
        if (!format.equals("csv") && !format.equals("json")) {
            throw new InvalidInputException("--format", "must be csv or json, got '" + format + "'");
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
            spec.commandLine().getOut().print(text);
            spec.commandLine().getOut().flush();
        } else {
            OutputFile.writeWhole("--out", out, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
            spec.commandLine().getErr().println("tertius: wrote " + found.size() + " poles and zeros to " + out);
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
