package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The built-in demo (a scenario of our own) writes every file it names, and they hold what it says. */
class DemoCommandTest {
    @TempDir
    Path dir;

    @Test
    void writesTheFilesItNames() throws IOException {
        Path out = dir.resolve("demo");
        CommandLineToolTest.Run r = CommandLineToolTest.run("demo", "--out", out.toString());
        assertEquals(0, r.status, r.err);
        for (String name : List.of("values.csv", "real-axis.csv", "real-axis.png", "pole-field.png", "poles.csv",
                "nls-profile.png")) {
            Path p = out.resolve(name);
            assertTrue(Files.size(p) > 0, name);
            assertTrue(r.out.contains(p.toAbsolutePath().toString()), "the demo names " + name);
        }
        BufferedImage img = ImageIO.read(out.resolve("nls-profile.png").toFile());
        assertEquals(900, img.getWidth());
        assertEquals(420, img.getHeight());
        // Psi(0, 0) = 4: the profile's defining value at the origin (its origin data a_-2(0) = (0, 2i, 2i))
        assertTrue(r.out.contains("Psi(0, 0) = 4.0000000000000"), r.out);
        List<String> values = Files.readAllLines(out.resolve("values.csv"));
        assertTrue(values.stream().anyMatch(l -> l.startsWith("z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err")));
    }
}
