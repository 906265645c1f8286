package org.mobident.report.html;

/**
 * A section another part of Mobident contributes to the HTML report (such as the scores against
 * known identities). Its markup must follow the report's rules: one {@code <section>} element,
 * XHTML-compatible, every user text escaped ({@link org.mobident.report.plot.Markup#escape}),
 * inline SVG only, no script, nothing fetched.
 */
@FunctionalInterface
public interface HtmlSection {

    /** The section's markup, starting with {@code <section} and ending with {@code </section>}. */
    String markup();
}
