package lotgate.sentencing;

import java.util.List;

/** A lot's sentence: accepted only if every defect class accepts it. */
public record Sentence(boolean accepted, List<ClassVerdict> classes) implements Outcome {
    public Sentence {
        classes = List.copyOf(classes);
    }

    public String verdict() {
        return accepted ? "accept" : "reject";
    }
}
