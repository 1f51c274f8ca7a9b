package lotgate.web;

/** Escaping and the page frame the workbench's pages share. Every text from outside goes through escape. */
final class Html {
    private Html() {
    }

    /** Text made inert in HTML content and in quoted attribute values. */
    static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(ch);
            }
        }
        return out.toString();
    }

    /** The pages in the navigation bar: path, label. */
    private static final String[][] PAGES = {{"/", "Design"}, {"/sentence", "Sentence"}, {"/suppliers", "Suppliers"}};

    /**
     * A whole page: head with the style sheet, the navigation with the current page marked, the body
     * (already escaped by its maker) and the scripts, all served from the workbench itself.
     */
    static String page(String title, String current, String csrf, String body, String... scripts) {
        StringBuilder out = new StringBuilder(8192);
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta name=\"lotgate-csrf\" content=\"").append(escape(csrf)).append("\">\n")
                .append("<title>").append(escape(title)).append(" - lotgate workbench</title>\n")
                .append("<link rel=\"icon\" href=\"data:,\">\n")
                .append("<link rel=\"stylesheet\" href=\"/assets/workbench.css\">\n</head>\n<body>\n")
                .append("<header class=\"bar\"><a class=\"mark\" href=\"/\"><span class=\"gate\" aria-hidden=\"true\">")
                .append("&#9646;&#9647;</span> lotgate <small>workbench</small></a>\n<nav>");
        for (String[] page : PAGES) {
            out.append("<a href=\"").append(page[0]).append('"');
            if (page[0].equals(current)) {
                out.append(" class=\"here\" aria-current=\"page\"");
            }
            out.append('>').append(page[1]).append("</a>");
        }
        out.append("</nav></header>\n<main>\n").append(body).append("\n</main>\n");
        out.append("<script src=\"/assets/common.js\"></script>\n");
        for (String script : scripts) {
            out.append("<script src=\"/assets/").append(escape(script)).append("\"></script>\n");
        }
        out.append("</body>\n</html>\n");
        return out.toString();
    }
}
