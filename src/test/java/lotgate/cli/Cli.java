package lotgate.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs lotgate in-process and captures what it prints. */
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
}
