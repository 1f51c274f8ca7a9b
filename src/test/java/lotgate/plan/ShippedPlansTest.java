package lotgate.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lotgate.sampling.DoubleDesign;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SequentialPlanDesigner;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.VariablesDesigner;
import lotgate.sampling.VariablesPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import org.junit.jupiter.api.Test;

/**
 * The example plans under plans/ load, and a fresh design gives the same plan for every class (double plans
 * with the default search space, n2 = n1; sequential plans with their own truncation point).
 */
class ShippedPlansTest {

    @Test
    void everyShippedPlanLoadsAndStillMatchesItsDesign() throws IOException {
        List<Path> files;
        try (Stream<Path> listing = Files.list(Path.of("plans"))) {
            // Plan families are read, with every plan they name, by PlanFamily.
            files = listing.filter(p -> p.toString().endsWith(".json") && !PlanFamily.isFamily(p)).sorted().toList();
        }
        assertFalse(files.isEmpty(), "plans/ should hold the demo's example plans");
        assertEquals(3, PlanFamily.read(Path.of("plans/quorrin-qp-7-tables.json")).variants().size());
        for (Path file : files) {
            SavedPlan saved = PlanFormat.read(file);
            SinglePlanDesigner designer = new SinglePlanDesigner(saved.model(), saved.lotSize());
            for (ClassPlan criteria : saved.classes()) {
                Plan again = redesign(saved, criteria);
                if (again != null) {
                    assertEquals(again, criteria.plan(), file + " " + criteria.defectClass().label());
                    continue;
                }
                SingleDesign fresh = switch (criteria.method()) {
                    case SavedPlan.SMALLEST_SAMPLE -> designer.design(criteria.designedFor());
                    case SavedPlan.FIXED_ACCEPTANCE -> designer.designForAcceptanceNumber(
                            ((SinglePlan) criteria.plan()).c(), criteria.designedFor());
                    default -> null;
                };
                if (fresh != null) {
                    assertEquals(criteria.plan(), assertInstanceOf(SingleDesign.Found.class, fresh).plan(),
                            file + " " + criteria.defectClass().label());
                }
            }
        }
    }

    /** A fresh design of a plan of the newer kinds, or null for single plans. */
    private static Plan redesign(SavedPlan saved, ClassPlan criteria) {
        if (criteria.plan() instanceof VariablesPlan variables) {
            return VariablesDesigner.design(criteria.designedFor(), variables.sigmaKnown()).plan();
        }
        if (criteria.plan() instanceof SequentialPlan sequential) {
            return new SequentialPlanDesigner(saved.model()).design(criteria.designedFor(), sequential.truncation()).plan();
        }
        if (criteria.method().equals(SavedPlan.SMALLEST_ASN)) {
            DoubleDesign design = new DoublePlanDesigner(saved.model(), saved.lotSize()).design(criteria.designedFor(),
                    new DoublePlanDesigner.Space(1.0, null), saved.model().producerPoint(criteria.designedFor().aql()));
            return ((DoubleDesign.Found) design).plan();
        }
        return null;
    }
}
