package org.tertius.core.piii;

import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.solution.Solution;

/**
 * An integrated Painleve III solution in arbitrary precision: the same polynomial form, its coefficients and
 * conversions computed from the exact parameters and start data at any working precision.
 */
final class Painleve3PreciseForm implements HighPrecisionForm {
    private static final String[] PARAMETER_NAMES = {"alpha", "beta", "gamma", "delta"};
    private final IntegratedSolution solution;
    private final ExactNumber[] parameters;
    private final ExactNumber z0;
    private final ExactNumber w0;
    private final ExactNumber dw0;

    Painleve3PreciseForm(IntegratedSolution solution, ExactNumber[] start) {
        this.solution = solution;
        this.parameters = solution.equation().exactParameters();
        this.z0 = start[0];
        this.w0 = start[1];
        this.dw0 = start[2];
    }

    @Override
    public Solution planner() {
        return solution.engine();
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
    public void requireDigits(int digits) {
        for (int i = 0; i < 4; i++) {
            require(PARAMETER_NAMES[i], parameters[i], digits);
        }
        require("z0", z0, digits);
        require("w0", w0, digits);
        require("dw0", dw0, digits);
    }

    private static void require(String name, ExactNumber x, int digits) {
        if (x.significantDigits() < digits) {
            throw new InvalidInputException(name, "is known to about " + x.significantDigits() + " significant digits"
                    + " only (it was given as a binary double), but " + digits + " digits were requested: give it"
                    + " exactly, as a decimal string or a rational p/q such as 1/3");
        }
    }

    private HighPrecisionParameters parameters(MpContext ctx) {
        return new HighPrecisionParameters(ctx, ctx.fromExact(parameters[0]), ctx.fromExact(parameters[1]),
                ctx.fromExact(parameters[2]), ctx.fromExact(parameters[3]));
    }

    @Override
    public MpComplex[] coefficients(MpContext ctx) {
        return solution.form().coefficients(parameters(ctx));
    }

    @Override
    public MpComplex startTau(MpContext ctx) {
        return ctx.log(ctx.fromExact(z0));
    }

    @Override
    public MpComplex[] startState(MpContext ctx) {
        return solution.form().toState(parameters(ctx), ctx.fromExact(z0), ctx.fromExact(w0), ctx.fromExact(dw0));
    }

    @Override
    public MpComplex[] values(MpContext ctx, MpComplex u, MpComplex[] state) {
        return solution.form().fromState(parameters(ctx), u, state);
    }
}
