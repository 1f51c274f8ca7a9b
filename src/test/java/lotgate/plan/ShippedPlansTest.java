package lotgate.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import org.junit.jupiter.api.Test;

/** The example plans under plans/ load, and a fresh design gives the same plan for every class. */
class ShippedPlansTest {

    @Test
    void everyShippedPlanLoadsAndStillMatchesItsDesign() throws IOException {
        List<Path> files;
        try (Stream<Path> listing = Files.list(Path.of("plans"))) {
            files = listing.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty(), "plans/ should hold the demo's example plans");
        for (Path file : files) {
            SavedPlan saved = PlanFormat.read(file);
            SinglePlanDesigner designer = new SinglePlanDesigner(saved.model(), saved.lotSize());
            for (ClassPlan criteria : saved.classes()) {
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
}
