package org.tertius.connection.scan;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.StringJoiner;
import org.tertius.core.InvalidInputException;
import org.tertius.core.step.SolverSettings;

/**
 * What the rows of a sweep depend on, as {@code key=value} entries in a fixed order, written on one line
 * ({@code kind=power-map; sigma=-0.9:0.9:7; ...; version=...}): the kind of sweep, its parameter ranges, the
 * solver settings and the version of the library. Two files hold parts of the same sweep exactly when their
 * signatures are equal. Doubles are written with the shortest decimals that read back to the same value.
 * Immutable.
 */
public final class SweepSignature {
    private final Map<String, String> entries;

    private SweepSignature(Map<String, String> entries) {
        this.entries = entries;
    }

    /** A signature of kind {@code kind}; add the entries in a fixed order with {@link Builder#put}. */
    public static Builder builder(String kind) {
        return new Builder(kind);
    }

    /**
     * Reads a signature line (without the comment prefix).
     *
     * @throws InvalidInputException ("signature") if an entry is not key=value or the kind is missing
     */
    public static SweepSignature parse(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String part : text.split("; ")) {
            int eq = part.indexOf('=');
            if (eq <= 0) {
                throw new InvalidInputException("signature", "expected key=value entries separated by '; ', got '"
                        + text + "'");
            }
            m.put(part.substring(0, eq), part.substring(eq + 1));
        }
        if (!m.containsKey("kind")) {
            throw new InvalidInputException("signature", "no kind= entry in '" + text + "'");
        }
        return new SweepSignature(m);
    }

    public String kind() {
        return entries.get("kind");
    }

    /**
     * The value of {@code key}.
     *
     * @throws InvalidInputException ("signature") if absent
     */
    public String get(String key) {
        String v = entries.get(key);
        if (v == null) {
            throw new InvalidInputException("signature", "no " + key + "= entry in '" + this + "'");
        }
        return v;
    }

    /** The solver settings written by {@link Builder#settings}. */
    public SolverSettings settings() {
        try {
            return SolverSettings.builder().order(Integer.parseInt(get("order")))
                    .tolerance(Double.parseDouble(get("tolerance")))
                    .padeTolerance(Double.parseDouble(get("pade-tolerance")))
                    .maxSteps(Integer.parseInt(get("max-steps")))
                    .initialStep(Double.parseDouble(get("initial-step")))
                    .maxError(Double.parseDouble(get("max-error"))).build();
        } catch (NumberFormatException e) {
            throw new InvalidInputException("signature", "malformed solver settings in '" + this + "'");
        }
    }

    /** The version of this library as written in signatures: the jar's, or "development" outside a jar. */
    public static String libraryVersion() {
        String v = SweepSignature.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }

    /**
     * The entries in which a signature text differs from a reference, in the order of the text, e.g.
     * "tolerance=1.0E-12 instead of 1.0E-13"; only the kind when the kinds differ.
     */
    public static String difference(String text, String reference) {
        Map<String, String> a = entries(text);
        Map<String, String> b = entries(reference);
        if (!String.valueOf(a.get("kind")).equals(String.valueOf(b.get("kind")))) {
            return "kind=" + a.get("kind") + " instead of " + b.get("kind");
        }
        StringJoiner out = new StringJoiner(", ");
        for (Map.Entry<String, String> e : a.entrySet()) {
            String other = b.get(e.getKey());
            if (!e.getValue().equals(other)) {
                out.add(e.getKey() + "=" + e.getValue() + (other == null ? " not expected" : " instead of " + other));
            }
        }
        for (String k : b.keySet()) {
            if (!a.containsKey(k)) {
                out.add("no " + k + "= entry");
            }
        }
        return out.length() == 0 ? "entries in another order" : out.toString();
    }

    private static Map<String, String> entries(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String part : text.split("; ")) {
            int eq = part.indexOf('=');
            m.put(eq < 0 ? part : part.substring(0, eq), eq < 0 ? "" : part.substring(eq + 1));
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SweepSignature && ((SweepSignature) o).entries.equals(entries);
    }

    @Override
    public int hashCode() {
        return entries.hashCode();
    }

    /** The one-line form, entries joined by "; ". */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        for (Map.Entry<String, String> e : entries.entrySet()) {
            if (b.length() > 0) {
                b.append("; ");
            }
            b.append(e.getKey()).append('=').append(e.getValue());
        }
        return b.toString();
    }

    /** Builds a signature entry by entry. */
    public static final class Builder {
        private final Map<String, String> entries = new LinkedHashMap<>();

        private Builder(String kind) {
            entries.put("kind", kind);
        }

        /** Adds an entry; keys and values must not contain "; " or line breaks. */
        public Builder put(String key, Object value) {
            String v = String.valueOf(value);
            if (key.contains("=") || key.contains(";") || v.contains("; ") || v.contains("\n")) {
                throw new IllegalArgumentException("signature entry " + key + "=" + v);
            }
            entries.put(key, v);
            return this;
        }

        /** Adds the solver settings (every field, so that the rows' dependence on them is complete). */
        public Builder settings(SolverSettings s) {
            return put("order", s.order()).put("tolerance", s.tolerance()).put("pade-tolerance", s.padeTolerance())
                    .put("max-steps", s.maxSteps()).put("initial-step", s.initialStep())
                    .put("max-error", s.maxError());
        }

        /** Adds the library version (last, by convention) and builds. */
        public SweepSignature build() {
            entries.put("version", libraryVersion());
            return new SweepSignature(new LinkedHashMap<>(entries));
        }
    }
}
