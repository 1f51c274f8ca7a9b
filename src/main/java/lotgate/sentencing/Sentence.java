package lotgate.sentencing;

import java.util.List;

/** A lot's sentence: accepted only if every defect class accepts it. */
public record Sentence(boolean accepted, List<ClassVerdict> classes) implements Outcome {
    public Sentence {
        classes = List.copyOf(classes);
    }

    /** Whether the lot is accepted with a count between a reduced plan's Ac and Re (normal inspection reinstated). */
    public boolean reinstatesNormal() {
        return accepted && classes.stream().anyMatch(ClassVerdict::reinstatesNormal);
    }

    public String verdict() {
        return accepted ? "accept" : "reject";
    }
}
