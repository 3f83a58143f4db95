package org.tertius.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Locale;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.Singularity;

/**
 * The one place that writes lists of poles and zeros of a solution's first value: CSV
 * {@code kind,z_re,z_im,sheet,lead_re,lead_im,err} (the variable's name in the columns) or JSON.
 */
final class SingularityRows {
    private SingularityRows() {
    }

    /** The CSV column line for a solution's variable. */
    static String columns(String variable) {
        return "kind," + variable + "_re," + variable + "_im,sheet,lead_re,lead_im,err";
    }

    static String csv(String variable, List<Singularity> found) {
        StringWriter sw = new StringWriter();
        PrintWriter w = new PrintWriter(sw);
        w.println(columns(variable));
        for (Singularity s : found) {
            w.println(String.format(Locale.ROOT, "%s,%.17g,%.17g,%d,%.17g,%.17g,%.3e", s.kind().label(),
                    s.point().re(), s.point().im(), s.point().sheet(), s.lead().getReal(), s.lead().getImaginary(),
                    s.error()));
        }
        w.flush();
        return sw.toString();
    }

    static String json(ComputedSolution sol, Grid g, List<Singularity> found) {
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = m.createObjectNode();
        root.put("equation", sol.equationDescription());
        root.put("value", sol.valueNames().get(0));
        if (g.logarithmic()) {
            root.put("log_strip", true);
        } else {
            root.put("sheet", g.sheet());
        }
        ArrayNode region = root.putArray("region");
        region.add(g.re0()).add(g.re1()).add(g.im0()).add(g.im1());
        String z = sol.coordinate().name();
        ArrayNode list = root.putArray("singularities");
        for (Singularity s : found) {
            ObjectNode o = list.addObject();
            o.put("kind", s.kind().label());
            o.put(z + "_re", s.point().re());
            o.put(z + "_im", s.point().im());
            o.put("sheet", s.point().sheet());
            o.put("lead_re", s.lead().getReal());
            o.put("lead_im", s.lead().getImaginary());
            o.put("err", s.error());
        }
        try {
            return m.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
