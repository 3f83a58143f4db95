package org.tertius.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.util.RawValue;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.tertius.core.TertiusException;

/**
 * The JSON form of value rows ({@code eval --format json}): the rows {@link ValueRows} writes as CSV, collected and
 * written as one object {@code {"comments": [...], "columns": [...], "rows": [{column: value, ...}, ...]}}. Numbers
 * are written with the very text of the CSV (JSON numbers have no precision limit: with {@code --digits} every digit is
 * there for a reader that keeps them, e.g. Python's {@code json.loads(text, parse_float=decimal.Decimal)}); the
 * nan values and inf errors of a point that could not be computed become null; other texts (integrals ok/drift)
 * stay strings.
 */
final class JsonValueRows {
    /** The grammar of a JSON number (RFC 8259, section 6): such texts are written as they are. */
    private static final Pattern NUMBER = Pattern.compile("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][-+]?[0-9]+)?");
    private final List<String> comments = new ArrayList<>();
    private String[] columns = new String[0];
    private final List<String[]> rows = new ArrayList<>();

    void comment(String text) {
        comments.add(text);
    }

    void columns(String csvHeader) {
        columns = csvHeader.split(",", -1);
    }

    /** A CSV row of the columns given. */
    void row(String csvRow) {
        String[] fields = csvRow.split(",", -1);
        if (fields.length != columns.length) {
            throw new IllegalStateException("a row of " + fields.length + " fields under " + columns.length
                    + " columns");
        }
        rows.add(fields);
    }

    String text() {
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = m.createObjectNode();
        ArrayNode c = root.putArray("comments");
        comments.forEach(c::add);
        ArrayNode names = root.putArray("columns");
        for (String n : columns) {
            names.add(n);
        }
        ArrayNode out = root.putArray("rows");
        for (String[] r : rows) {
            ObjectNode o = out.addObject();
            for (int i = 0; i < r.length; i++) {
                String f = r[i];
                if ("nan".equals(f) || "inf".equals(f)) {
                    o.putNull(columns[i]);
                } else if (NUMBER.matcher(f).matches()) {
                    o.putRawValue(columns[i], new RawValue(f));
                } else {
                    o.put(columns[i], f);
                }
            }
        }
        try {
            return m.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new TertiusException("could not write JSON: " + e.getMessage());
        }
    }
}
