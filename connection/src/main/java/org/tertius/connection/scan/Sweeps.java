package org.tertius.connection.scan;

import org.tertius.core.InvalidInputException;

/** The kinds of sweep, and the sweep a signature describes (for merging and plotting files). */
public final class Sweeps {
    private Sweeps() {
    }

    /**
     * The sweep described by {@code signature}: its kind, ranges and solver settings.
     *
     * @throws InvalidInputException ("signature") for an unknown kind or a malformed entry
     */
    public static Sweep<? extends ScanRow> of(SweepSignature signature) {
        switch (signature.kind()) {
            case DecayingSweep.KIND:
                return DecayingSweep.of(signature);
            case PowerFamilySweep.KIND:
                return PowerFamilySweep.of(signature);
            default:
                throw new InvalidInputException("signature", "unknown kind of sweep '" + signature.kind()
                        + "' (known: " + DecayingSweep.KIND + ", " + PowerFamilySweep.KIND + ")");
        }
    }
}
