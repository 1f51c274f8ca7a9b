package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The other commands start as before: no class of the workbench or its server loads when they run. */
class WorkbenchLoadingTest {
    @Test
    void anotherCommandLoadsNoServerClass() throws Exception {
        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xshare:off", "-verbose:class", "-cp", System.getProperty("java.class.path"), "lotgate.cli.Main",
                "design", "--aql", "1%", "--ltpd", "5%").redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, process.waitFor(), output);
        assertTrue(output.contains("Inspect n = 132 units"), output);
        List<String> loaded = output.lines().filter(line -> line.contains("class,load"))
                .filter(line -> line.contains("org.eclipse.jetty") || line.contains(" lotgate.web.")).toList();
        assertEquals(List.of(), loaded);
    }
}
