package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.math.BigDecimal;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * {@code eval --format json} carries the same rows as the CSV: every field with the same text (numbers as JSON
 * numbers with all their digits, also at --digits), nan and inf as null, comments and columns alike.
 */
class EvalJsonTest {
    private static final String[] DEMO = {"eval", "--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1",
        "--z0", "1", "--w0", "1/2", "--dw0", "1/3"};
    private static final ObjectMapper EXACT = new ObjectMapper()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS);

    private static void sameRows(String[] args, int status) throws Exception {
        CommandLineToolTest.Run csv = CommandLineToolTest.run(args);
        CommandLineToolTest.Run json = CommandLineToolTest.run(CommandLineToolTest.with(args, "--format", "json"));
        assertEquals(status, csv.status, csv.err);
        assertEquals(status, json.status, json.err);
        assertEquals(csv.err, json.err);
        List<String> lines = csv.out.lines().collect(Collectors.toList());
        List<String> comments = lines.stream().filter(l -> l.startsWith("# ")).map(l -> l.substring(2))
                .collect(Collectors.toList());
        List<String> data = lines.stream().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
        JsonNode root = EXACT.readTree(json.out);
        assertEquals(comments.size(), root.get("comments").size());
        for (int i = 0; i < comments.size(); i++) {
            assertEquals(comments.get(i), root.get("comments").get(i).asText());
        }
        String[] columns = data.get(0).split(",", -1);
        assertEquals(columns.length, root.get("columns").size());
        assertEquals(data.size() - 1, root.get("rows").size());
        for (int r = 1; r < data.size(); r++) {
            String[] fields = data.get(r).split(",", -1);
            JsonNode row = root.get("rows").get(r - 1);
            for (int c = 0; c < columns.length; c++) {
                JsonNode v = row.get(columns[c]);
                String f = fields[c];
                if (f.equals("nan") || f.equals("inf")) {
                    assertTrue(v.isNull(), columns[c] + " = " + v);
                } else if (v.isNumber()) {
                    // the number node holds every digit of the CSV text
                    assertEquals(0, v.decimalValue().compareTo(new BigDecimal(f)), columns[c] + ": " + f
                            + " against " + v);
                    assertTrue(json.out.contains("\"" + columns[c] + "\" : " + f), columns[c] + ": " + f);
                } else {
                    assertEquals(f, v.asText(), columns[c]);
                }
            }
        }
    }

    @Test
    void doubleRowsAreTheCsvRows() throws Exception {
        sameRows(CommandLineToolTest.with(DEMO, "--at", "2,1/3,-1+2i"), 0);
    }

    @Test
    void manyDigitsKeepEveryDigit() throws Exception {
        sameRows(CommandLineToolTest.with(DEMO, "--at", "1/3", "--digits", "40"), 0);
    }

    @Test
    void memberChecksAndUnreachedPoints() throws Exception {
        sameRows(new String[] {"eval", "--profile", "nearfield", "--times", "0.5", "--at", "1", "--integrals"}, 0);
        // a point 99999 sheets away is not reached: its values are null, the exit status 3
        sameRows(CommandLineToolTest.with(DEMO, "--at", "2", "--sheet", "99999"), Main.EXIT_UNREACHED);
    }

    @Test
    void otherFormatsAreRefused() {
        CommandLineToolTest.Run r = CommandLineToolTest.run(CommandLineToolTest.with(DEMO, "--at", "2", "--format",
                "xml"));
        assertEquals(Main.EXIT_BAD_INPUT, r.status);
        assertEquals("", r.out);
        assertTrue(r.err.contains("--format") && r.err.contains("json"), r.err);
    }
}
