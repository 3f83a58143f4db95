package org.tertius.connection.scan;

import java.nio.file.Path;
import java.util.List;
import org.tertius.core.step.SolverSettings;

/**
 * The sweep of the decaying family w ~ 1 - 2 lambda K0(2x) of PIII(0, 0, 1, -1) over lambda, each member
 * classified by {@link DecayingClassifier}. Immutable, thread-safe.
 */
public final class DecayingSweep implements Sweep<Classification> {
    /** The kind written in the signature. */
    public static final String KIND = "decaying-lambda";
    private final ParameterRange lambda;
    private final SolverSettings settings;
    private final DecayingClassifier classifier;

    /** The members lambda = each value of {@code lambda} (equally spaced). */
    public DecayingSweep(ParameterRange lambda, SolverSettings settings) {
        this.lambda = lambda;
        this.settings = settings;
        this.classifier = new DecayingClassifier(settings);
    }

    /** The sweep a signature of kind {@link #KIND} describes. */
    static DecayingSweep of(SweepSignature signature) {
        return new DecayingSweep(ParameterRange.parse("signature", signature.get("lambda"), false),
                signature.settings());
    }

    @Override
    public String title() {
        return "decaying family of PIII(0,0,1,-1), w ~ 1 - 2 lambda K0(2x); lambda " + lambda;
    }

    @Override
    public SweepSignature signature() {
        return SweepSignature.builder(KIND).put("lambda", lambda).settings(settings).build();
    }

    @Override
    public String csvHeader() {
        return Classification.CSV_HEADER;
    }

    @Override
    public int size() {
        return lambda.count();
    }

    @Override
    public Classification classify(int index) {
        return classifier.classify(index, lambda.value(index)).withIndex(index);
    }

    @Override
    public Classification failed(int index) {
        return new Classification(index, lambda.value(index), false, Double.NaN, ScanRow.FAILED, "unknown", Double.NaN,
                Double.NaN);
    }

    @Override
    public Classification parse(String row) {
        return Classification.parse(row);
    }

    @Override
    public void plot(List<Classification> rows, Path png) {
        ScanPlot.write(rows, "Decaying family of PIII(0,0,1,-1): first real zero/pole and sigma", "lambda", png);
    }
}
