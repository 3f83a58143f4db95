package org.tertius.connection.scan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tertius.core.InvalidInputException;
import org.tertius.core.step.SolverSettings;

/** Shards partition the tasks; ranges and signatures read back what they write; sweep files survive cut rows. */
class ShardTest {
    private static final long SEED = 20_261_204L;

    @Test
    void theShardsOfASplitCoverEveryTaskExactlyOnce() {
        qt().withFixedSeed(SEED).withExamples(300)
                .forAll(integers().between(0, 500), integers().between(1, 40))
                .checkAssert((total, n) -> {
                    int[] owner = new int[total];
                    for (int i = 1; i <= n; i++) {
                        Shard s = Shard.of(i, n);
                        int last = -1;
                        for (int task : s.tasks(total)) {
                            assertTrue(task > last && task < total && s.contains(task));
                            owner[task]++;
                            last = task;
                        }
                    }
                    for (int task = 0; task < total; task++) {
                        assertEquals(1, owner[task], "task " + task + " of " + total + " in " + n + " shards");
                    }
                });
    }

    @Test
    void shardTextIsIOverNWithinRange() {
        Shard s = Shard.parse("--shard", " 2/4 ");
        assertEquals("2/4", s.toString());
        assertArrayEquals(new int[] {1, 5, 9}, s.tasks(10));
        for (String bad : new String[] {"0/4", "5/4", "1/0", "a/b", "2", "1/2/3", "-1/4", "1/100001", ""}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> Shard.parse("--shard", bad));
            assertTrue(e.getMessage().startsWith("--shard: expected I/N"), e.getMessage());
        }
    }

    @Test
    void rangesReadBackTheSameValuesAndRefuseBadText() {
        ParameterRange r = ParameterRange.parse("--range", "0.05:0.6:56", false);
        ParameterRange again = ParameterRange.parse("signature", r.toString(), false);
        for (int i = 0; i < r.count(); i++) {
            assertEquals(r.value(i), again.value(i), 0.0);
        }
        assertEquals(0.6, r.value(55), 0.0);
        ParameterRange g = ParameterRange.parse("--rectangle", "0.1:10:5", true);
        assertEquals(1.0, g.value(2), 1e-15);
        assertEquals(10.0, g.value(4), 0.0);
        for (String bad : new String[] {"1:2", "1:2:1", "1:1:3", "a:2:3", "1:2:x", "1+i:2:3"}) {
            InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ParameterRange.parse("--range", bad, false));
            assertTrue(e.getMessage().startsWith("--range: "), e.getMessage());
        }
        assertThrows(InvalidInputException.class, () -> ParameterRange.parse("--rectangle", "0:1:3", true));
    }

    @Test
    void signatureReadsBackItsSolverSettingsAndNamesTheEntriesThatDiffer() {
        PowerFamilySweep sweep = new PowerFamilySweep(ParameterRange.linear("sigma", -0.5, 0.5, 3),
                ParameterRange.geometric("B", 0.5, 2, 3),
                SolverSettings.builder().tolerance(1e-12).order(28).build());
        SweepSignature s = SweepSignature.parse(sweep.signature().toString());
        assertEquals(sweep.signature(), s);
        assertEquals(sweep.signature(), Sweeps.of(s).signature());
        String other = s.toString().replace("tolerance=1.0E-12", "tolerance=1.0E-13");
        assertEquals("tolerance=1.0E-13 instead of 1.0E-12", SweepSignature.difference(other, s.toString()));
    }

    @Test
    void aLastLineWithoutLineBreakIsDroppedAndARepeatedTaskRefused(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("s.csv");
        Files.writeString(f, "# tertius sweep: t\n# signature: kind=x\n# shard: 1/2\nindex,a\n0,1\n2,3\n4,5.0001", StandardCharsets.UTF_8);
        SweepFile read = SweepFile.read("--out", f);
        assertEquals(2, read.rows().size());
        assertEquals(Shard.of(1, 2), read.shard("--out"));
        assertEquals("kind=x", read.signatureText("--out"));
        Files.writeString(f, "# tertius sweep: t\n# signature: kind=x\nindex,a\n0,1\n0,1\n", StandardCharsets.UTF_8);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SweepFile.read("--out", f));
        assertTrue(e.getMessage().contains("task 0 appears twice"), e.getMessage());
        Files.writeString(f, "index,a\n0,1\n", StandardCharsets.UTF_8);
        InvalidInputException notSweep = assertThrows(InvalidInputException.class,
            () -> SweepFile.read("--out", f).signatureText("--out"));
        assertTrue(notSweep.getMessage().contains("is not a sweep file"), notSweep.getMessage());
    }
}
