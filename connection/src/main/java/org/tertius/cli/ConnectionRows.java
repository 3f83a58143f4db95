package org.tertius.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.ComplexText;

/**
 * The one place that writes the answers of {@code connect}: rows {@code quantity, precision, numerical,
 * numerical_err, closed_form, closed_form_err} (a closed form only where one is known, else empty), after comment
 * lines; as CSV (comments start with '#'), JSON ({@code comments} and {@code rows}) or an aligned text table.
 * Complex numbers are written a+bi with 17 digits; errors are absolute.
 */
final class ConnectionRows {
    static final String[] COLUMNS = {"quantity", "precision", "numerical", "numerical_err", "closed_form",
        "closed_form_err"};

    private final List<String> comments = new ArrayList<>();
    private final List<String[]> rows = new ArrayList<>();

    void comment(String text) {
        comments.add(text);
    }

    /** A row of text cells (six, as {@link #COLUMNS}). */
    void add(String... cells) {
        if (cells.length != COLUMNS.length) {
            throw new IllegalArgumentException("a row has " + COLUMNS.length + " cells, got " + cells.length);
        }
        rows.add(cells.clone());
    }

    /** A double-precision complex quantity without a closed form. */
    void add(String quantity, Complex value, double error) {
        add(quantity, "double", complex(value), error(error), "", "");
    }

    /** A double-precision complex quantity with its closed form. */
    void add(String quantity, Complex value, double error, Complex closed, double closedError) {
        add(quantity, "double", complex(value), error(error), complex(closed), error(closedError));
    }

    /**
     * Puts a closed form beside the numerical value of the row named quantity (the first such row with its closed-form
     * cells empty), or adds a row with the closed form alone when there is none.
     */
    void closedForm(String quantity, Complex closed, double closedError) {
        for (String[] row : rows) {
            if (row[0].equals(quantity) && row[4].isEmpty()) {
                row[1] = "double";
                row[4] = complex(closed);
                row[5] = error(closedError);
                return;
            }
        }
        add(quantity, "double", "", "", complex(closed), error(closedError));
    }

    /** A real quantity (e.g. an angle) without a closed form. */
    void addReal(String quantity, double value, double error) {
        add(quantity, "double", real(value), error(error), "", "");
    }

    /** A label (kind, note): the value only. */
    void addLabel(String quantity, String value) {
        add(quantity, "", value, "", "", "");
    }

    List<String[]> rows() {
        return List.copyOf(rows);
    }

    static String complex(Complex c) {
        return ComplexText.format(c);
    }

    static String real(double x) {
        return String.format(Locale.ROOT, "%.17g", x);
    }

    /** An error estimate with 3 digits; an exact 0 (exact data printed exactly) as 0. */
    static String error(double e) {
        if (e == 0) {
            return "0";
        }
        return String.format(Locale.ROOT, "%.2e", e);
    }

    /** Writes everything in the format asked for (csv, json or text). */
    void write(PrintWriter out, String format) {
        switch (format) {
            case "json":
                out.print(json());
                break;
            case "text":
                text(out);
                break;
            default:
                for (String c : comments) {
                    out.println("# " + c);
                }
                out.println(String.join(",", COLUMNS));
                for (String[] r : rows) {
                    out.println(String.join(",", csvCells(r)));
                }
        }
        out.flush();
    }

    private static String[] csvCells(String[] r) {
        String[] c = new String[r.length];
        for (int i = 0; i < r.length; i++) {
            c[i] = r[i].contains(",") || r[i].contains("\"") ? "\"" + r[i].replace("\"", "\"\"") + "\"" : r[i];
        }
        return c;
    }

    private String json() {
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = m.createObjectNode();
        ArrayNode cs = root.putArray("comments");
        comments.forEach(cs::add);
        ArrayNode list = root.putArray("rows");
        for (String[] r : rows) {
            ObjectNode o = list.addObject();
            for (int i = 0; i < COLUMNS.length; i++) {
                o.put(COLUMNS[i], r[i]);
            }
        }
        try {
            return m.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private void text(PrintWriter out) {
        for (String c : comments) {
            out.println(c);
        }
        List<String[]> all = new ArrayList<>();
        all.add(COLUMNS);
        all.addAll(rows);
        int[] width = new int[COLUMNS.length];
        for (String[] r : all) {
            for (int i = 0; i < r.length; i++) {
                width[i] = Math.max(width[i], r[i].length());
            }
        }
        for (String[] r : all) {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < r.length; i++) {
                sb.append(String.format(Locale.ROOT, "%-" + (width[i] + 2) + "s", r[i]));
            }
            out.println(sb.toString().stripTrailing());
        }
    }
}
