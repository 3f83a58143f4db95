package org.tertius.connection.scan;

import java.nio.file.Path;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.step.SolverSettings;

/**
 * The 2-D sweep of the power family w ~ B x^sigma (x -&gt; 0+) of PIII(0, 0, 1, -1) over a rectangle of
 * (sigma, B): sigma equally spaced in (-1, 1), B in geometric progression (B &gt; 0; B acts as a scale), each
 * member classified by {@link PowerFamilyClassifier}. Task index = iB * (number of sigma values) + iSigma: rows
 * go along sigma first. Immutable, thread-safe.
 */
public final class PowerFamilySweep implements Sweep<PowerFamilyClassification> {
    /** The kind written in the signature. */
    public static final String KIND = "power-map";
    /** Largest number of members. */
    public static final long MAX_TASKS = 10_000_000L;
    private final ParameterRange sigma;
    private final ParameterRange b;
    private final SolverSettings settings;
    private final PowerFamilyClassifier classifier;

    /**
     * @throws InvalidInputException ("sigma", "B") unless sigma is linear within (-1, 1), B geometric, and there
     *     are at most {@link #MAX_TASKS} members
     */
    public PowerFamilySweep(ParameterRange sigma, ParameterRange b, SolverSettings settings) {
        if (sigma.isGeometric() || !(Math.abs(sigma.from()) < 1 && Math.abs(sigma.to()) < 1)) {
            throw new InvalidInputException("sigma", "must be equally spaced within (-1, 1) (|sigma| = 1 is the"
                    + " logarithmic case), got " + sigma);
        }
        if (!b.isGeometric()) {
            throw new InvalidInputException("B", "must be in geometric progression (B > 0), got " + b);
        }
        if ((long) sigma.count() * b.count() > MAX_TASKS) {
            throw new InvalidInputException("sigma", sigma.count() + " x " + b.count() + " members is more than the "
                    + MAX_TASKS + " allowed");
        }
        this.sigma = sigma;
        this.b = b;
        this.settings = settings;
        this.classifier = new PowerFamilyClassifier(settings);
    }

    /** The sweep a signature of kind {@link #KIND} describes. */
    static PowerFamilySweep of(SweepSignature signature) {
        return new PowerFamilySweep(ParameterRange.parse("signature", signature.get("sigma"), false),
                ParameterRange.parse("signature", signature.get("b"), true), signature.settings());
    }

    public ParameterRange sigma() {
        return sigma;
    }

    public ParameterRange b() {
        return b;
    }

    @Override
    public String title() {
        return "power family w ~ B x^sigma at 0 of PIII(0,0,1,-1); sigma " + sigma + ", B " + b
                + " (geometric); first zero or pole of w on [" + PowerFamilyClassifier.WINDOW_START + ", "
                + PowerFamilyClassifier.WINDOW_END + "]";
    }

    @Override
    public SweepSignature signature() {
        return SweepSignature.builder(KIND).put("sigma", sigma).put("b", b)
                .put("window", PowerFamilyClassifier.WINDOW_START + ":" + PowerFamilyClassifier.WINDOW_END)
                .settings(settings).build();
    }

    @Override
    public String csvHeader() {
        return PowerFamilyClassification.CSV_HEADER;
    }

    @Override
    public int size() {
        return sigma.count() * b.count();
    }

    @Override
    public PowerFamilyClassification classify(int index) {
        return classifier.classify(index, sigmaOf(index), bOf(index));
    }

    @Override
    public PowerFamilyClassification failed(int index) {
        return new PowerFamilyClassification(index, sigmaOf(index), bOf(index), ScanRow.FAILED, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN);
    }

    @Override
    public PowerFamilyClassification parse(String row) {
        return PowerFamilyClassification.parse(row);
    }

    @Override
    public void plot(List<PowerFamilyClassification> rows, Path png) {
        ScanMap.write(rows, sigma, b, png);
    }

    private double sigmaOf(int index) {
        return sigma.value(index % sigma.count());
    }

    private double bOf(int index) {
        return b.value(index / sigma.count());
    }
}
