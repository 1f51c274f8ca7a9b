package lotgate.report;

/** The cautions lotgate prints where sampling can let a harmful unit through. */
public final class Cautions {
    public static final String ZERO_ACCEPTANCE = String.join("\n",
            "Caution: a zero-acceptance plan (c = 0) is common practice for critical characteristics, but no",
            "sampling plan can show that a lot is free of nonconforming units. Where a nonconforming unit could",
            "hurt someone, the customer's requirements, local codes and licensed practice decide whether",
            "sampling is allowed at all; they often call for 100% inspection or proven process control.");

    public static final String VARIABLES = String.join("\n",
            "Caution: the k-method's risks hold only for normal measurements from a stable process with a capable",
            "gauge; lotgate tests each lot's sample for normality and resolution and warns when they fail. Where a",
            "unit beyond the limits could hurt someone, the customer's requirements, local codes and licensed",
            "practice decide whether sampling by variables is allowed at all.");

    private Cautions() {
    }
}
