package lotgate.jobs;

import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.history.NameMatch;

/**
 * A supplier and part as the store records them, from the names a person typed: the recorded spelling when
 * the typed one differs from it only in case and spacing, so that a lot joins the history it belongs to.
 */
final class RecordedNames {

    /** The names to use; {@code found} is false when the store holds no lots under them. */
    record Names(String supplier, String part, boolean found) {
    }

    private RecordedNames() {
    }

    /** The recorded names for the typed ones (each may be null: any), or the typed ones when none match. */
    static Names of(HistoryStore store, String supplier, String part) {
        if (supplier == null && part == null || store.holdsRecordsOf(supplier, part)) {
            return new Names(supplier, part, true);
        }
        String recordedSupplier = supplier;
        if (supplier != null) {
            recordedSupplier = NameMatch.resolve(supplier, suppliers(store));
            if (recordedSupplier == null) {
                return new Names(supplier, part, false);
            }
        }
        String recordedPart = part;
        if (part != null) {
            recordedPart = NameMatch.resolve(part, parts(store, recordedSupplier));
            if (recordedPart == null) {
                return new Names(recordedSupplier, part, false);
            }
        }
        return new Names(recordedSupplier, recordedPart, store.holdsRecordsOf(recordedSupplier, recordedPart));
    }

    /** Every supplier the store has lots of. */
    static List<String> suppliers(HistoryStore store) {
        return store.supplierTotals().stream().map(HistoryStore.SupplierTotals::supplier).toList();
    }

    /** Every part of the supplier (of every supplier when null) that the store has lots of. */
    static List<String> parts(HistoryStore store, String supplier) {
        return store.rows(supplier, null).stream().filter(LotRow::isLot).map(LotRow::part).distinct().toList();
    }

    /** The error for names under which the store holds no lots, with the closest recorded names. */
    static JobException notFound(HistoryStore store, Names names) {
        List<String> suppliers = suppliers(store);
        if (names.supplier() != null && !suppliers.contains(names.supplier())) {
            return new JobException(JobException.Kind.NOT_FOUND, "supplier", "the history store " + store.location()
                    + " has no lots of '" + names.supplier() + "'" + (names.part() == null ? "" : ", part '"
                    + names.part() + "'") + NameMatch.suggestion(names.supplier(), suppliers)
                    + " (see 'lotgate history')");
        }
        List<String> parts = parts(store, names.supplier());
        return new JobException(JobException.Kind.NOT_FOUND, "part", "the history store " + store.location()
                + " has no lots of " + (names.supplier() == null ? "any supplier" : "'" + names.supplier() + "'")
                + ", part '" + names.part() + "'" + NameMatch.suggestion(names.part(), parts)
                + " (see 'lotgate history')");
    }
}
