package org.tertius.core.mp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The hand-over of rounds between a caller and its lockstep partner (plain arrays, no locks). */
class LockstepPartnerTest {
    @Test
    void everyRoundSeesTheCallersWritesAndReturnsThePartnersWrites() {
        int rounds = 20000;
        long[] input = new long[rounds];
        long[] fromPartner = new long[rounds];
        long[] fromCaller = new long[rounds];
        try (LockstepPartner p = new LockstepPartner(r -> fromPartner[r] = 3 * input[r] + (r > 0 ? fromCaller[r - 1] : 0))) {
            for (int r = 0; r < rounds; r++) {
                input[r] = r;
                int round = r;
                p.round(r, () -> fromCaller[round] = input[round] + 1);
                // both shares of the round are complete and visible here
                assertEquals(3L * r + (r > 0 ? r : 0), fromPartner[r], "round " + r);
                assertEquals(r + 1L, fromCaller[r], "round " + r);
            }
        }
    }

    @Test
    void anExceptionOfThePartnerEndsTheRoundWithIt() {
        try (LockstepPartner p = new LockstepPartner(r -> {
            if (r == 3) {
                throw new ArithmeticException("round 3 failed");
            }
        })) {
            for (int r = 0; r < 3; r++) {
                p.round(r, () -> { });
            }
            ArithmeticException e = assertThrows(ArithmeticException.class, () -> p.round(3, () -> { }));
            assertEquals("round 3 failed", e.getMessage());
        }
    }
}
