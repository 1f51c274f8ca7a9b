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
import lotgate.sampling.SinglePlanDesigner;
import org.junit.jupiter.api.Test;

/** The example plans under plans/ load, and a fresh design gives the same plan. */
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
            SingleDesign fresh = switch (saved.method()) {
                case SavedPlan.SMALLEST_SAMPLE -> designer.design(saved.designedFor());
                case SavedPlan.FIXED_ACCEPTANCE -> designer.designForAcceptanceNumber(
                        ((lotgate.sampling.SinglePlan) saved.plan()).c(), saved.designedFor());
                default -> null;
            };
            if (fresh != null) {
                assertEquals(saved.plan(), assertInstanceOf(SingleDesign.Found.class, fresh).plan(), file.toString());
            }
        }
    }
}
