package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The design answers without a browser: a saved plan per defect class, and refusals named after their fields. */
class DesignApiTest {
    @TempDir
    Path folder;

    private static int count(String text, String part) {
        return text.split(java.util.regex.Pattern.quote(part), -1).length - 1;
    }

    @Test
    void aSavedPlanPerDefectClassOpensWithOneCurvePerClass() throws Exception {
        try (Served served = Served.start(folder)) {
            String classes = java.net.URLEncoder.encode("critical:c=0,aql=0.1%,ltpd=2%\nmajor:aql=1%,ltpd=5%",
                    java.nio.charset.StandardCharsets.UTF_8);
            HttpResponse<String> saved = served.post("/api/plans", "scheme=single&classes=" + classes
                    + "&name=flange-classes&description=Flange+bolts+(invented)");
            assertEquals(200, saved.statusCode(), saved.body());
            HttpResponse<String> opened = served.get("/api/plan?name=flange-classes");
            assertEquals(200, opened.statusCode(), opened.body());
            // critical: n = 114, c = 0 (0.98^114 = 0.09995 is the first power of 0.98 at most 10%); major: n = 132,
            // c = 3 (the README's worked example, checked against SciPy 1.10.1 in SinglePlanDesignerTest).
            assertTrue(opened.body().contains("\"name\":\"critical: n = 114, c = 0\""), opened.body());
            assertTrue(opened.body().contains("\"name\":\"major: n = 132, c = 3\""), opened.body());
            assertEquals(2, count(opened.body(), "\"oc\":"));
            // Each class's AQL and LTPD on its own curve: 0.999^114 = 0.89221 (common practice: P(accept) of c = 0
            // is (1 - p)^n).
            assertTrue(opened.body().contains("critical AQL 0.1%: P(accept) 89.22%"), opened.body());
        }
    }

    @Test
    void theSchemesOwnFieldsAreRefusedByName() throws Exception {
        try (Served served = Served.start(folder)) {
            HttpResponse<String> ratio = served.get("/api/design?scheme=double&aql=1%25&ltpd=5%25&second-ratio=0.1");
            assertEquals(400, ratio.statusCode());
            assertTrue(ratio.body().contains("\"field\":\"second-ratio\",\"message\":\"--second-ratio 0.1: give a ratio"
                    + " from 0.25 to 10, or 'free'\""), ratio.body());
            HttpResponse<String> truncation = served.get("/api/design?scheme=sequential&aql=1%25&ltpd=5%25"
                    + "&truncate-at=500&model=hypergeometric&lot-size=100");
            assertEquals(400, truncation.statusCode());
            assertTrue(truncation.body().contains("\"field\":\"truncate-at\",\"message\":\"--truncate-at 500 exceeds"
                    + " --lot-size 100\""), truncation.body());
            HttpResponse<String> lowerAql = served.get("/api/design?scheme=variables&aql=1%25&ltpd=5%25&lower=1"
                    + "&upper=2&limits=separate&lower-aql=6%25");
            assertEquals(400, lowerAql.statusCode());
            assertTrue(lowerAql.body().contains("\"field\":\"lower-aql\""), lowerAql.body());
            HttpResponse<String> measured = served.get("/api/design?scheme=variables&aql=1%25&ltpd=5%25&lower=1"
                    + "&sample-size=20");
            assertEquals(400, measured.statusCode());
            assertTrue(measured.body().contains("\"field\":\"k\",\"message\":\"give both --sample-size N and --k K"),
                    measured.body());
        }
    }
}
