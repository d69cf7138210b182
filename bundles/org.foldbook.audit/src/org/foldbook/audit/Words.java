package org.foldbook.audit;

import org.foldbook.model.derived.Quantities;

/** The audit's wording of levels: {@link Quantities} with rounding noise around zero shown as 0. */
final class Words {
    private Words() {
    }

    static String db(double v) {
        return Quantities.db(Math.abs(v) < 0.05 ? 0.0 : v);
    }

    static String signedDb(double v) {
        return Quantities.signedDb(Math.abs(v) < 0.05 ? 0.0 : v);
    }
}
