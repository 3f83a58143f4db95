package org.tertius.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.MonodromyData;

/**
 * The one place that writes monodromy data: CSV rows {@code x_re,x_im,sheet,quantity,re,im,err} (the variable's name
 * in the columns), one row per number, or JSON. Quantities are named {@code m}, {@code m0}, {@code s_inf_k},
 * {@code s_0_k}, {@code E11} .. {@code E22} (conventions of MonodromyMap). In double precision the numbers are
 * written with 17 significant digits; with {@code digits} they are decimals of that many significant digits.
 */
final class MonodromyRows {
    private final String variable;
    private final int digits;

    /**
     * @param variable the solution's variable (x for members, z for Painleve III)
     * @param digits significant digits of the decimals, 0 for double precision
     */
    MonodromyRows(String variable, int digits) {
        this.variable = variable;
        this.digits = digits;
    }

    /** The names of the quantities of member n in the order of {@link #values}. */
    static List<String> names(int order) {
        List<String> names = new ArrayList<>(List.of("m", "m0"));
        for (int k = 1; k <= 2 * order; k++) {
            names.add("s_inf_" + k);
        }
        names.add("s_0_1");
        names.add("s_0_2");
        names.addAll(List.of("E11", "E12", "E21", "E22"));
        return names;
    }

    /** The quantities of the data in the order of {@link #names}. */
    static <T> List<Estimate<T>> values(MonodromyData<T> d) {
        List<Estimate<T>> v = new ArrayList<>(List.of(d.exponentAtInfinity(), d.exponentAtZero()));
        for (int k = 1; k <= 2 * d.order(); k++) {
            v.add(d.stokesAtInfinity(k));
        }
        v.add(d.stokesAtZero(1));
        v.add(d.stokesAtZero(2));
        for (int i = 1; i <= 2; i++) {
            for (int j = 1; j <= 2; j++) {
                v.add(d.connection(i, j));
            }
        }
        return v;
    }

    String columns() {
        return variable + "_re," + variable + "_im,sheet,quantity,re,im,err";
    }

    /** The rows of one point. */
    <T> List<String> rows(SurfacePoint point, MonodromyData<T> d) {
        List<String> names = names(d.order());
        List<Estimate<T>> values = values(d);
        List<String> rows = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            String[] parts = parts(d.arithmetic(), values.get(i).value());
            rows.add(String.format(Locale.ROOT, "%.17g,%.17g,%d,%s,%s,%s,%.3e", point.re(), point.im(), point.sheet(),
                    names.get(i), parts[0], parts[1], values.get(i).error()));
        }
        return rows;
    }

    /** The JSON document of all points. */
    <T> String json(String equation, List<SurfacePoint> points, List<MonodromyData<T>> data, List<String> notes,
                    Double invariance) {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("equation", equation);
        root.put("precision", digits == 0 ? "double" : digits + " digits");
        ArrayNode n = root.putArray("notes");
        notes.forEach(n::add);
        ArrayNode list = root.putArray("points");
        for (int p = 0; p < points.size(); p++) {
            MonodromyData<T> d = data.get(p);
            ObjectNode o = list.addObject();
            o.put(variable + "_re", points.get(p).re());
            o.put(variable + "_im", points.get(p).im());
            o.put("sheet", points.get(p).sheet());
            o.put("normalisation", d.connectionNormalization().name().toLowerCase(Locale.ROOT));
            o.put("worst_check", d.worstCheck());
            ObjectNode q = o.putObject("quantities");
            List<String> names = names(d.order());
            List<Estimate<T>> values = values(d);
            for (int i = 0; i < names.size(); i++) {
                ObjectNode e = q.putObject(names.get(i));
                String[] parts = parts(d.arithmetic(), values.get(i).value());
                if (digits == 0) {
                    e.put("re", Double.parseDouble(parts[0]));
                    e.put("im", Double.parseDouble(parts[1]));
                } else {
                    e.put("re", parts[0]);
                    e.put("im", parts[1]);
                }
                e.put("err", values.get(i).error());
            }
        }
        if (invariance != null) {
            root.put("invariance_ratio", invariance);
        }
        try {
            return mapper.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private <T> String[] parts(AnalyticArithmetic<T> ar, T value) {
        if (digits == 0 || !(value instanceof MpComplex)) {
            Complex c = ar.toComplex(value);
            return new String[] {String.format(Locale.ROOT, "%.17g", c.getReal()),
                String.format(Locale.ROOT, "%.17g", c.getImaginary())};
        }
        BigDecimal[] p = MpContext.exactDecimal((MpComplex) value);
        return new String[] {decimal(p[0]), decimal(p[1])};
    }

    private String decimal(BigDecimal d) {
        if (d.signum() == 0) {
            return "0";
        }
        return d.round(new MathContext(digits, RoundingMode.HALF_EVEN)).toString().replace("E+", "e").replace("E", "e");
    }
}
