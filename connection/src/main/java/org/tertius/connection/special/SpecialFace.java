package org.tertius.connection.special;

import java.util.List;
import java.util.Optional;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * A {@link SpecialSolution} (optionally transformed by a {@link BacklundChain}) presenting the common face of
 * computed solutions, so that tables, pictures and the command line serve it as they serve integrated solutions.
 * Values come from the closed form at each point (double precision with error estimates; N digits through
 * {@link #evaluate(ExactPoint, int)}); a pole of the closed form is reported as an unreachable point. Immutable.
 */
public final class SpecialFace implements PointwiseSolution {
    private final SpecialSolution source;
    private final BacklundChain chain;
    private final SpecialSolution solution;

    private SpecialFace(SpecialSolution source, BacklundChain chain) {
        this.source = source;
        this.chain = chain;
        this.solution = chain == null ? source : chain.image(source);
    }

    /** The face of a special solution. */
    public static SpecialFace of(SpecialSolution solution) {
        return new SpecialFace(solution, null);
    }

    /**
     * The face of the Backlund image of a special solution.
     *
     * @throws InvalidInputException if a step of the chain does not apply to the parameters it meets
     */
    public static SpecialFace of(SpecialSolution source, BacklundChain chain) {
        return new SpecialFace(source, chain);
    }

    /** The solution evaluated (the image when a chain was given). */
    public SpecialSolution solution() {
        return solution;
    }

    @Override
    public String equationDescription() {
        return "PIII(" + solution.parameters().text() + ") [" + solution.equation().type().describe() + "]";
    }

    @Override
    public String methodDescription() {
        String what = chain == null ? source.description() : "Backlund image " + chain + ", parameters "
                + chain.trailText(source.parameters()) + ", of: " + source.description();
        return "closed form, evaluated at each point: " + what.replace('\n', ' ');
    }

    @Override
    public Painleve3 equation() {
        return solution.equation();
    }

    @Override
    public List<String> history() {
        return chain == null ? List.of() : List.of(chain.description(source.parameters()).split("\n"));
    }

    @Override
    public Coordinate coordinate() {
        return Painleve3Solution.COORDINATE;
    }

    @Override
    public List<String> valueNames() {
        return Painleve3Solution.VALUE_NAMES;
    }

    @Override
    public SolutionValue valueAt(SurfacePoint point) {
        try {
            return solution.evaluate(point).toSolutionValue();
        } catch (InvalidInputException e) {
            throw new UnreachableTargetException(e.getMessage());
        }
    }

    @Override
    public PreciseValue evaluate(ExactPoint point, int digits) {
        return solution.evaluate(point, digits);
    }

    @Override
    public Optional<EngineReading> engineReading() {
        return Optional.empty();
    }

    @Override
    public HighPrecisionForm highPrecisionForm() {
        throw new InvalidInputException("digits", "a closed form is evaluated directly to N digits at each point"
                + " (PointwiseSolution.evaluate), not replayed along a path");
    }
}
