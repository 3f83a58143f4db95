package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.ExactNumber;

/**
 * Numbers typed by the user, kept exact: decimals, rationals p/q and complex numbers of them are read as exact
 * numbers (so that --digits computes with the value typed, not its double); anything else the tool reads as a complex
 * number is taken as its double, vouched for to 15 digits.
 */
final class ExactText {
    private ExactText() {
    }

    /** The exact number a text denotes (or its double's binary value when only the double reader accepts it). */
    static ExactNumber parse(String option, String text) {
        if (text == null) {
            throw new InvalidInputException(option, "is required (give it as an option or in the --problem file)");
        }
        try {
            return ExactNumber.parse(option, text);
        } catch (InvalidInputException notExact) {
            return ExactNumber.ofDouble(option, ComplexText.parse(option, text));
        }
    }

    /** A comma-separated list of numbers. */
    static List<ExactNumber> list(String option, String text) {
        List<ExactNumber> out = new ArrayList<>();
        if (text == null || text.isBlank()) {
            return out;
        }
        for (String part : text.split(",")) {
            out.add(parse(option, part));
        }
        return out;
    }
}
