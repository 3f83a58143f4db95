package org.tertius.connection.special;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * A {@link BacklundChain} applied to any Painleve III solution (one integrated by the engine, a family member, an
 * image under a symmetry): at each point the base's w and w' with their errors are mapped by the chain
 * (NIST DLMF §32.7), the errors propagated to first order together with the rounding of the map. The image solves
 * the equation with the parameters the chain reaches ({@link #history()} lists them step by step). Its poles and
 * zeros are not those of the base, so no engine path tree is read for it: regions evaluate it point by point.
 * N digits: the base replayed in arbitrary precision ({@link HighPrecisionSolution}, with 10 guard digits), then
 * mapped. Immutable and thread-safe.
 */
public final class BacklundImage implements PointwiseSolution {
    /** Guard digits asked of the base beyond those requested (the map may cancel some). */
    static final int GUARD_DIGITS = 10;

    private final ComputedSolution base;
    private final ParameterSet parameters;
    private final ParameterSet image;
    private final BacklundChain chain;
    private final Map<Integer, HighPrecisionSolution> precise = new ConcurrentHashMap<>();

    private BacklundImage(ComputedSolution base, ParameterSet parameters, BacklundChain chain) {
        if (!base.valueNames().equals(Painleve3Solution.VALUE_NAMES)) {
            throw new InvalidInputException("backlund", "the Backlund transformations act on Painleve III solutions"
                    + " (values w, w'), not on " + String.join(", ", base.valueNames()));
        }
        this.base = base;
        this.parameters = parameters;
        this.chain = chain;
        this.image = chain.apply(parameters);
    }

    /**
     * The image of {@code base}, a solution of the equation with the given parameters (given exactly: the
     * equalities that decide which steps apply are tested exactly).
     *
     * @throws InvalidInputException if the base is not a Painleve III solution or a step does not apply to the
     *     parameters it meets (the message names the step and the condition)
     */
    public static BacklundImage of(ComputedSolution base, ExactParameters parameters, BacklundChain chain) {
        return new BacklundImage(base, ParameterSet.of(parameters), chain);
    }

    /** The parameters of the image. */
    public ParameterSet parameters() {
        return image;
    }

    @Override
    public String equationDescription() {
        return "PIII(" + image.text() + ") [" + image.equation().type().describe() + "]";
    }

    @Override
    public String methodDescription() {
        return "Backlund image " + chain + " (DLMF 32.7), parameters " + chain.trailText(parameters) + ", of the"
                + " solution " + base.methodDescription() + "; errors of w, w' propagated through the map";
    }

    @Override
    public Painleve3 equation() {
        return image.equation();
    }

    @Override
    public List<String> history() {
        return List.of(chain.description(parameters).split("\n"));
    }

    @Override
    public Coordinate coordinate() {
        return base.coordinate();
    }

    @Override
    public List<String> valueNames() {
        return Painleve3Solution.VALUE_NAMES;
    }

    @Override
    public SolutionValue valueAt(SurfacePoint point) {
        Painleve3Value v = Painleve3Value.of(base.valueAt(point));
        try {
            return chain.apply(parameters, v).toSolutionValue();
        } catch (InvalidInputException e) {
            throw new UnreachableTargetException(e.getMessage());
        }
    }

    @Override
    public PreciseValue evaluate(ExactPoint point, int digits) {
        int asked = Math.min(HighPrecisionSolution.MAX_DIGITS, Math.max(HighPrecisionSolution.MIN_DIGITS,
                digits + GUARD_DIGITS));
        HighPrecisionSolution hp = precise.computeIfAbsent(asked, d -> HighPrecisionSolution.of(base, d));
        HighPrecisionValue h = hp.evaluate(point);
        PreciseValue v = new PreciseValue(point.toSurfacePoint(), h.value(0), h.value(1),
                logError(h, 0), logError(h, 1));
        return chain.apply(parameters, v, point.z());
    }

    /** log10 of the absolute error of value i from its correct significant digits. */
    private static double logError(HighPrecisionValue h, int i) {
        double magnitude = PreciseValue.log10Abs(h.value(i));
        return (magnitude == Double.NEGATIVE_INFINITY ? 0 : magnitude) - h.correctDigits();
    }

    @Override
    public Optional<EngineReading> engineReading() {
        return Optional.empty();
    }

    @Override
    public HighPrecisionForm highPrecisionForm() {
        throw new InvalidInputException("digits", "a Backlund image is computed to N digits by mapping the base's"
                + " N-digit values at each point (PointwiseSolution.evaluate), not replayed along a path");
    }
}
