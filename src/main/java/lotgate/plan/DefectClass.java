package lotgate.plan;

/**
 * The class of a nonconformity, by seriousness: critical (can hurt someone or stop the product
 * working), major, minor; "any" stands for a plan that counts every nonconformity alike.
 */
public enum DefectClass {
    ANY, CRITICAL, MAJOR, MINOR;

    /** The name in plan files, sheets and output: any, critical, major, minor. */
    public String label() {
        return Words.of(this);
    }

    /** The class a label names, or null. */
    public static DefectClass of(String label) {
        return Words.read(values(), label);
    }
}
