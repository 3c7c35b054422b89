package barfit.serve;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** The page and its two assets, from the jar: nothing is fetched from anywhere else. */
final class Page {
    private static final String HTML = resource("page.html");
    private static final String SCRIPT = resource("page.js");
    private static final String STYLE = resource("page.css");

    private final String html;

    Page(String fileName, String token, String caution) {
        this.html = HTML.replace("{{file}}", escape(fileName))
                .replace("{{caution}}", escape(caution))
                .replace("{{token}}", token);
    }

    String html() {
        return html;
    }

    static String script() {
        return SCRIPT;
    }

    static String style() {
        return STYLE;
    }

    static String escape(String s) {
        return s.replace("&", "&amp;")
                .replace("<", "&lt;")
                .replace(">", "&gt;")
                .replace("\"", "&quot;")
                .replace("'", "&#39;");
    }

    private static String resource(String name) {
        try (InputStream in = Page.class.getResourceAsStream("/barfit/serve/" + name)) {
            if (in == null) {
                throw new IllegalStateException("the page's " + name + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
