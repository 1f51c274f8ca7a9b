package lotgate.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Runs lotgate in-process (or, where the environment matters, in a process of its own) and captures what it prints. */
final class Cli {
    record Result(int exitCode, String out, String err) {
    }

    private Cli() {
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Result(code, out.toString(), err.toString());
    }

    /**
     * Runs lotgate in a JVM of its own with the given environment variables (PGPASSWORD and PGPASSFILE
     * removed unless given); standard output and error come back together in {@code out}.
     */
    static Result process(Map<String, String> environment, String... args) throws Exception {
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-cp", classpath, Main.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder builder = new ProcessBuilder(command);
        builder.environment().remove("PGPASSWORD");
        builder.environment().remove("PGPASSFILE");
        builder.environment().remove("LOTGATE_RESULT_WORDS");
        builder.environment().putAll(environment);
        Process process = builder.redirectErrorStream(true).start();
        String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        return new Result(process.waitFor(), out, "");
    }
}
