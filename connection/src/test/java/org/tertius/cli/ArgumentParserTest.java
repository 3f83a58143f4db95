package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.cli.Options;
import org.junit.jupiter.api.Test;

/** The tool's rules for command lines, on a few options of each kind. */
class ArgumentParserTest {
    private static Options options() {
        Options o = new Options();
        o.addOption(OptionKinds.value("--beta", "B", "beta"));
        o.addOption(OptionKinds.value("--at", "Z", "targets"));
        o.addOption(OptionKinds.value("--digits", "D", "digits"));
        o.addOption(OptionKinds.required("--out", "FILE", "file"));
        o.addOption(OptionKinds.flag("--resume", "resume"));
        OptionKinds.standard(o);
        return o;
    }

    private static Arguments parse(String... args) {
        return ArgumentParser.parse(options(), args);
    }

    private static String error(String... args) {
        return assertThrows(UsageException.class, () -> parse(args)).getMessage();
    }

    @Test
    void valuesMayStartWithAMinusOrBeAttached() {
        Arguments a = parse("--beta", "-1/2", "--at=-1.5-2i", "--digits", "-3");
        assertEquals("-1/2", a.text("--beta"));
        assertEquals("-1.5-2i", a.text("--at"));
        assertEquals(-3, a.integer("--digits", null));
        assertEquals("-i", parse("--beta", "-i").text("--beta"));
        // values that look like options of the parser library (a short option, a single-dash long option)
        assertEquals("-h", parse("--beta", "-h").text("--beta"));
        assertEquals("-beta", parse("--at", "-beta").text("--at"));
        assertEquals("-summary.csv", parse("--out", "-summary.csv").text("--out"));
        assertEquals("\"2\"", parse("--at", "\"2\"").text("--at"));
    }

    @Test
    void flagsMayBeWrittenWithTrueOrFalse() {
        assertTrue(parse("--resume").has("--resume"));
        assertTrue(parse("--resume=true").has("--resume"));
        assertFalse(parse("--resume=false").has("--resume"));
        assertFalse(parse().has("--resume"));
        assertEquals("--resume: expected true or false, got 'yes'", error("--resume=yes"));
    }

    @Test
    void unknownAbbreviatedSingleDashRepeatedAndStrayArgumentsAreRefused() {
        assertEquals("Unknown option: '--bogus'", error("--bogus", "3"));
        assertEquals("Unknown option: '--dig'", error("--dig", "30"));
        assertEquals("Unknown option: '-digits'", error("-digits", "30"));
        assertEquals("Unknown option: '--h'", error("--h"));
        assertEquals("option '--at' should be specified only once", error("--at", "1", "--at=2"));
        assertEquals("Unmatched argument: 'extra'", error("--at", "1", "extra"));
        assertEquals("Unmatched arguments: '--at', '2'", error("--", "--at", "2"));
        assertEquals("Missing required parameter for option '--at' (Z)", error("--at"));
        assertEquals("Missing required parameter for option '--at' (Z)", error("--at", "--digits", "3"));
    }

    @Test
    void badValuesNameTheOptionAndWhatItAccepts() {
        Arguments a = parse("--digits", "abc", "--at", "x", "--beta", "0x10");
        assertEquals("--digits: expected an integer in [16, 5000], got 'abc'",
                assertThrows(UsageException.class, () -> a.integer("--digits", "an integer in [16, 5000]")).getMessage());
        assertEquals("--beta: expected an integer, got '0x10'",
                assertThrows(UsageException.class, () -> a.integer("--beta", null)).getMessage());
        assertEquals("--at: expected a number, got 'x'",
                assertThrows(UsageException.class, () -> a.number("--at", null)).getMessage());
        assertEquals("--at: must be csv or json, got 'x'",
                assertThrows(UsageException.class, () -> a.choice("--at", "csv", "json")).getMessage());
        assertEquals("csv", parse().choice("--at", "csv", "json"));
        assertEquals(null, parse().integer("--digits", null));
    }

    @Test
    void requiredOptionsAreCheckedAfterHelpAndVersion() {
        assertTrue(parse("--help").has("--help"));
        assertTrue(parse("-hV").has("--version"));
        assertEquals("Missing required option: '--out=FILE'",
                assertThrows(UsageException.class, () -> parse("--at", "1").checkRequired()).getMessage());
        parse("--out", "x.csv").checkRequired();
    }
}
