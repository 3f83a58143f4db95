package org.tertius.tests;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * A reference-data file of PIII values: '#' header lines (source, parameters, start data, generating command)
 * with "# Parameters: alpha = .., beta = .., ..." and "# Start: z0 = .. (sheet 0), w(z0) = .., w'(z0) = .."
 * lines, then CSV rows z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,digits with values as decimal strings.
 */
final class ReferenceData {
    /** One reference row. */
    static final class Row {
        final SurfacePoint point;
        final Complex w;
        final Complex dw;
        final int digits;
        final BigDecimal[] exact;

        Row(SurfacePoint point, Complex w, Complex dw, int digits, BigDecimal[] exact) {
            this.point = point;
            this.w = w;
            this.dw = dw;
            this.digits = digits;
            this.exact = exact;
        }
    }

    final Map<String, String> header = new HashMap<>();
    final List<Row> rows = new ArrayList<>();

    static ReferenceData load(String resource) {
        ReferenceData d = new ReferenceData();
        try (InputStream in = ReferenceData.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing reference resource " + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            boolean headerSeen = false;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    String t = line.substring(1).trim();
                    int c = t.indexOf(':');
                    if (c > 0) {
                        d.header.putIfAbsent(t.substring(0, c).trim(), t.substring(c + 1).trim());
                    }
                    continue;
                }
                if (!headerSeen) {
                    headerSeen = true;
                    continue;
                }
                String[] f = line.split(",");
                BigDecimal[] v = new BigDecimal[4];
                for (int i = 0; i < 4; i++) {
                    v[i] = new BigDecimal(f[3 + i]);
                }
                d.rows.add(new Row(SurfacePoint.of(Double.parseDouble(f[0]), Double.parseDouble(f[1]),
                        Integer.parseInt(f[2])), new Complex(v[0].doubleValue(), v[1].doubleValue()),
                        new Complex(v[2].doubleValue(), v[3].doubleValue()), Integer.parseInt(f[7]), v));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return d;
    }

    /** "alpha = 1, beta = -1/2, gamma = 1, delta = -1" -> the four texts. */
    String[] parameters() {
        return values(header.get("Parameters"), "alpha", "beta", "gamma", "delta");
    }

    /** "z0 = 1 (sheet 0), w(z0) = 1/2, w'(z0) = 1/3  (exact)" -> the three texts. */
    String[] start() {
        return values(header.get("Start"), "z0", "w(z0)", "w'(z0)");
    }

    private static String[] values(String line, String... keys) {
        String[] out = new String[keys.length];
        for (String part : line.split(",")) {
            String[] kv = part.split("=");
            if (kv.length != 2) {
                continue;
            }
            String k = kv[0].trim();
            String v = kv[1].trim().replaceAll("\\(.*\\)", "").trim();
            for (int i = 0; i < keys.length; i++) {
                if (keys[i].equals(k)) {
                    out[i] = v;
                }
            }
        }
        return out;
    }
}
