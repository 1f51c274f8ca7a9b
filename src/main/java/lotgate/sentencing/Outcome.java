package lotgate.sentencing;

/** What applying a plan to a sample gives: a sentence, or the instruction to inspect more units first. */
public sealed interface Outcome permits Sentence, Pending {
}
