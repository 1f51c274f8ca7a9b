package lotgate.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * A sentencing process for the crash test of outputs: sentences lots one by one, each with an HTML
 * report and a decision record, and prints "done LOT" after each run has ended.
 * Arguments: store, output folder, plan, sheet, first lot number, count.
 */
public final class SentencingRecorder {
    private SentencingRecorder() {
    }

    public static void main(String[] args) {
        String store = args[0];
        String folder = args[1];
        int first = Integer.parseInt(args[4]);
        int count = Integer.parseInt(args[5]);
        for (int i = first; i < first + count; i++) {
            String lot = "K" + i;
            StringWriter err = new StringWriter();
            int code = Main.run(new PrintWriter(new StringWriter()), new PrintWriter(err), "sentence", args[2], args[3],
                    "--lot", lot, "--supplier", "Invented Works", "--part", "IW-1", "--store", store, "--create-store",
                    "--report", folder + "/" + lot + ".html", "--record", folder + "/" + lot + ".json");
            System.out.println(code == 0 ? "done " + lot : "failed " + lot + " " + code + " " + err);
            System.out.flush();
        }
    }
}
