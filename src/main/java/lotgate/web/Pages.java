package lotgate.web;

import static lotgate.web.Html.escape;

/** The workbench's pages: frames and forms written here, filled in the browser from the JSON answers. */
final class Pages {
    private Pages() {
    }

    private static String field(String name, String label, String value, String hint) {
        return field("f-" + name, name, label, value, hint);
    }

    /** A text field with an id of its own, for a field name that two schemes' parts both carry. */
    private static String field(String id, String name, String label, String value, String hint) {
        return "<label for=\"" + id + "\">" + label + (hint.isEmpty() ? "" : " <span class=\"hint\">" + hint + "</span>")
                + "</label><input type=\"text\" id=\"" + id + "\" name=\"" + name + "\" value=\"" + escape(value)
                + "\" autocomplete=\"off\" spellcheck=\"false\">" + errorSlot(name);
    }

    private static String checkbox(String name, String label) {
        return "<label><input type=\"checkbox\" id=\"f-" + name + "\" name=\"" + name + "\" value=\"yes\"> " + label
                + "</label>" + errorSlot(name);
    }

    private static String pair(String left, String right) {
        return "<div class=\"pair\"><div>" + left + "</div><div>" + right + "</div></div>";
    }

    /** The inputs of one scheme (or several, space-separated), with its less-used ones folded away. */
    private static String forScheme(String schemes, String shown, String folded) {
        return "<div data-for-scheme=\"" + schemes + "\" class=\"hidden\">" + shown + (folded.isEmpty() ? ""
                : "<details class=\"more\"><summary>More for " + schemes + " plans</summary>" + folded + "</details>")
                + "</div>";
    }

    private static String errorSlot(String name) {
        return "<p class=\"field-error\" data-error-for=\"" + name + "\"></p>";
    }

    private static String select(String name, String label, String... options) {
        StringBuilder out = new StringBuilder("<label for=\"f-" + name + "\">" + label + "</label><select id=\"f-" + name
                + "\" name=\"" + name + "\">");
        for (String option : options) {
            int bar = option.indexOf('|');
            String value = bar < 0 ? option : option.substring(0, bar);
            String text = bar < 0 ? option : option.substring(bar + 1);
            out.append("<option value=\"").append(value).append("\">").append(text).append("</option>");
        }
        return out.append("</select>").append(errorSlot(name)).toString();
    }

    static String design(String csrf, Workbench.Settings settings) {
        String body = """
                <div class="columns">
                <section>
                <form id="design" class="panel" autocomplete="off" novalidate>
                <h2>What the plan must do</h2>
                """
                + select("scheme", "Scheme", "single|single: n and c", "double|double: two samples",
                        "multiple|multiple: stages you give", "sequential|sequential: unit by unit (Wald)",
                        "variables|variables: measured characteristic")
                + "<div class=\"pair\"><div>" + field("aql", "AQL", "1%", "(good lots)") + "</div><div>"
                + field("ltpd", "LTPD", "5%", "(bad lots)") + "</div></div>"
                + "<div class=\"pair\"><div>" + field("alpha", "Producer's risk alpha", "5%", "") + "</div><div>"
                + field("beta", "Consumer's risk beta", "10%", "") + "</div></div>"
                + "<div class=\"pair\"><div>"
                + select("model", "Model", "binomial|binomial", "hypergeometric|hypergeometric",
                        "poisson|Poisson")
                + "</div><div>" + field("lot-size", "Lot size N", "", "(optional)") + "</div></div>"
                + "<div class=\"pair\" data-for-scheme=\"single\"><div>" + field("acceptance", "Acceptance number c", "", "(fix it)")
                + "</div><div>" + field("sample-size", "Sample size n", "", "(evaluate)") + "</div></div>"
                + forScheme("double", pair(field("second-ratio", "Second sample", "1", "(times n1, or free)"),
                        field("asn-at", "Least ASN at", "", "(default: the AQL)")),
                        pair(field("first-rejection", "First rejection r1", "", "(default: c2 + 1)"),
                                checkbox("curtailed", "curtailed ASN (stop at rejection)"))
                        + field("f-double-stages", "stages", "Given stages", "", "N:C:R twice, e.g. 50:1:4 100:3"))
                + forScheme("multiple", field("stages", "Stages", "", "N:C:R each, e.g. 50:-:3 50:1:4 50:3"), "")
                + forScheme("sequential", field("truncate-at", "Truncate at", "", "(units; default: 3 times the single n)"),
                        checkbox("plain-wald", "keep Wald's lines as asked (risks may then exceed them)"))
                + forScheme("variables", field("characteristic", "Characteristic", "", "(e.g. bore diameter)")
                        + pair(field("lower", "Lower limit", "", ""), field("upper", "Upper limit", "", ""))
                        + pair(field("unit", "Unit", "", "(e.g. mm)"), field("sigma", "Known sigma", "",
                                "(empty: unknown, from each sample)")),
                        select("limits", "Both limits", "|combined (M-method)", "separate|separate (k-method at each)")
                        + pair(field("lower-aql", "Lower limit's AQL", "", "(separate)"),
                                field("lower-ltpd", "Lower limit's LTPD", "", "(separate)"))
                        + pair(field("f-variables-n", "sample-size", "Sample size n", "", "(evaluate)"),
                                field("k", "Constant k", "", "(with n)")))
                + "<div data-for-scheme=\"single\"><label for=\"f-classes\">Defect classes <span class=\"hint\">one a line,"
                + " e.g. critical:c=0,aql=0.1%,ltpd=1%</span></label><textarea id=\"f-classes\" name=\"classes\""
                + " spellcheck=\"false\"></textarea>" + errorSlot("classes") + "</div>"
                + """
                <p class="form-error" role="alert"></p>
                <p class="status" id="design-status"></p>
                </form>
                <form id="save" class="panel no-print" autocomplete="off" novalidate>
                <h2>Save the plan</h2>
                """
                + field("name", "Plan name", "", "(letters, digits, - and _)")
                + field("description", "Description", "", "(optional)")
                + """
                <label><input type="checkbox" name="replace" value="yes"> replace a saved plan of that name</label>
                <p class="form-error" role="alert"></p>
                <button type="submit" id="save-button">Save to the plans folder</button>
                <p class="status" id="save-status"></p>
                </form>
                <section class="panel no-print"><h2>Saved plans</h2>
                <p class="status">In <span class="mono" id="plans-folder"></span></p>
                <ul class="saved" id="saved"></ul></section>
                </section>
                <section>
                <div class="panel" id="answer-panel"><h2>The plan</h2>
                <div class="tiles" id="tiles"></div>
                <pre class="answer" id="answer" aria-live="polite"></pre>
                </div>
                <div class="panel"><h2>Curves</h2>
                <div class="tabs" role="tablist">
                <button type="button" role="tab" data-curve="oc" aria-selected="true">OC: P(accept)</button>
                <button type="button" role="tab" data-curve="aoq" aria-selected="false">AOQ</button>
                <button type="button" role="tab" data-curve="ati" aria-selected="false">ATI</button>
                <button type="button" role="tab" data-curve="asn" aria-selected="false">ASN</button>
                </div>
                <div id="curve"></div>
                <p class="no-print"><button type="button" class="quiet" id="pin">Lay this plan on the chart</button>
                <button type="button" class="quiet" id="unpin">Clear laid plans</button></p>
                <ul id="pinned"></ul>
                </div>
                </section>
                </div>
                """;
        body = body.replace("<span class=\"mono\" id=\"plans-folder\"></span>",
                "<span class=\"mono\" id=\"plans-folder\">" + escape(settings.plans().toString()) + "</span>");
        return Html.page("Plan design", "/", csrf, body, "chart.js", "design.js");
    }

    static String sentence(String csrf) {
        String body = """
                <div class="columns">
                <section>
                <form id="lot" class="panel no-print" autocomplete="off" novalidate>
                <h2>The lot</h2>
                <label for="f-plan">Saved plan or plan family</label><select id="f-plan" name="plan"></select>
                <p class="field-error" data-error-for="plan"></p>
                <label for="f-sheet-file">Inspection sheet (.xlsx, .xls, .csv)</label>
                <div class="drop" id="drop">Drop the sheet here, or
                <input type="file" id="f-sheet-file" name="sheet-file" accept=".xlsx,.xls,.csv"></div>
                <p class="field-error" data-error-for="sheet-file"></p>
                """
                + field("lot", "Lot", "", "(default: from the sheet)")
                + field("supplier", "Supplier", "", "")
                + field("part", "Part", "", "")
                + "<div class=\"pair\"><div>" + field("lot-size", "Lot size N", "", "") + "</div><div>"
                + field("received", "Received", "", "(2026-03-14)") + "</div></div>"
                + field("inspector", "Inspector", "", "")
                + "<label><input type=\"checkbox\" name=\"record\" value=\"yes\" checked> record the lot in the history</label>"
                + "<details class=\"more\" id=\"more-sheet\"><summary>Where the sample is on the sheet</summary>"
                + field("sheet", "Sheet (tab) of the workbook", "", "(default: the first not named 'lot')")
                + pair(field("rows", "Rows of the sample", "", "(first-last, e.g. 2-126)"),
                        field("header-row", "Row of the column names", "", "(default: found)"))
                + field("columns", "Your column names", "", "(role=name, e.g. unit=Serial,result=Outcome)")
                + field("result-words", "Your words for pass and fail", "", "(e.g. pass=GO,Passed;fail=NOGO,Scrap)")
                + select("delimiter", "Values in a CSV file separated by", "|found from the column names", "comma|commas",
                        "semicolon|semicolons", "tab|tabs")
                + "</details><details class=\"more\" id=\"more-record\"><summary>Lot details file, correction,"
                + " confidence, production</summary>"
                + "<label for=\"f-lot-file\">Lot details file <span class=\"hint\">(key and value rows; default: the"
                + " workbook's 'lot' sheet)</span></label><input type=\"file\" id=\"f-lot-file\" name=\"lot-file\""
                + " accept=\".xlsx,.xls,.csv\">" + errorSlot("lot-file")
                + pair(field("supersedes", "Corrects record number", "", "(from the history)"),
                        field("confidence", "Confidence of the bounds", "95%", ""))
                + field("reason", "Why the record is corrected", "", "")
                + select("production", "The supplier's production", "steady|steady",
                        "irregular|irregular (ends reduced inspection)")
                + """
                </details>
                <p class="form-error" role="alert"></p>
                <button type="submit" id="sentence-button">Sentence the lot</button>
                <p class="status" id="sentence-status"></p>
                </form>
                </section>
                <section>
                <div class="panel" id="verdict-panel"><h2>Verdict</h2>
                <div id="verdict"><p class="status">Choose a plan and a sheet, then sentence the lot.</p></div>
                </div>
                <form class="panel no-print" id="bench" autocomplete="off" novalidate>
                <h2>At the bench: unit by unit</h2>
                <p class="status">For the plan chosen above; say each unit as you inspect it.</p>
                <div class="pair"><div><button type="button" id="unit-good">Conforming</button>
                <button type="button" id="unit-bad" class="quiet">Nonconforming</button></div>
                <div><label for="f-defects">or nonconformities in this unit</label>
                <input type="number" min="0" id="f-defects" name="defects" value="0">
                <button type="button" class="quiet" id="unit-count">Add unit</button></div></div>
                <p class="field-error" data-error-for="units"></p>
                <p class="form-error" role="alert"></p>
                <div class="bench-units" id="bench-units"></div>
                <div id="bench-state"></div>
                <p><button type="button" class="quiet" id="unit-undo">Undo last unit</button>
                <button type="button" class="quiet" id="unit-reset">Start again</button></p>
                </form>
                </section>
                </div>
                """;
        return Html.page("Sentencing", "/sentence", csrf, body, "sentence.js");
    }

    static String suppliers(String csrf) {
        String body = """
                <div class="panel" id="store-panel"><h2>The history store</h2><div id="store"></div></div>
                <div class="panel"><h2>Suppliers ranked</h2>
                <p class="status" id="ranking-status"></p>
                <div id="ranking"></div></div>
                """;
        return Html.page("Suppliers", "/suppliers", csrf, body, "chart.js", "suppliers.js");
    }

    static String supplier(String csrf, String name) {
        String shown = name == null ? "" : name;
        String body = "<div class=\"panel\" id=\"supplier-panel\" data-supplier=\"" + escape(shown) + "\"><h1 id=\"supplier-name\">"
                + escape(shown) + "</h1><p class=\"status\" id=\"supplier-status\"></p><div id=\"supplier-facts\"></div>"
                + "<p class=\"no-print\" id=\"downloads\"></p></div>"
                + """
                <div class="panel"><h2>p-chart: fraction nonconforming per lot</h2><div id="p-chart"></div></div>
                <div class="columns-2">
                <div class="panel"><h2>Pareto of defects</h2><div id="pareto"></div></div>
                <div class="panel"><h2>Inspection severity</h2><div id="severity"></div></div>
                </div>
                <div class="panel"><h2>Rejected lots</h2><div id="rejected"></div></div>
                <div class="panel"><h2>The audit in the command's words</h2><pre class="answer" id="audit-text"></pre></div>
                """;
        return Html.page(shown.isEmpty() ? "Supplier" : shown, "/suppliers", csrf, body, "chart.js", "suppliers.js");
    }
}
