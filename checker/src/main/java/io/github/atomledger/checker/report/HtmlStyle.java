package io.github.atomledger.checker.report;

import java.util.List;

/**
 * The report's stylesheet (inline; nothing is fetched). Colours come from the Okabe–Ito palette
 * (Okabe &amp; Ito 2008, "Color Universal Design"), chosen to stay distinct for the common forms of
 * colour-vision deficiency; severity is also always written as a word, never shown by colour alone.
 * Filters work without scripts: hidden radio buttons before {@code <main>} and sibling selectors.
 */
final class HtmlStyle {

    /** Okabe–Ito: vermillion, orange, blue, bluish green, reddish purple, sky blue, yellow. */
    static final String ERROR = "#D55E00";
    static final String WARNING = "#E69F00";
    static final String INFO = "#0072B2";
    static final String CLEAN = "#009E73";

    private HtmlStyle() {
    }

    static final String BASE = """
            :root{--err:#D55E00;--warn:#E69F00;--info:#0072B2;--ok:#009E73;--ink:#1b1b1b;--mute:#5a5a5a;--line:#d0d0d0;--bg:#fafaf7}
            *{box-sizing:border-box}
            body{margin:0;font:15px/1.45 system-ui,-apple-system,"Segoe UI",sans-serif;color:var(--ink);background:var(--bg)}
            header{padding:18px 28px 10px;border-bottom:3px solid var(--ink);background:#fff}
            header h1{margin:0 0 4px;font-size:22px;letter-spacing:.02em}
            .verdict{display:inline-block;padding:2px 10px;border-radius:3px;font-weight:700;color:#fff}
            .verdict.failed{background:var(--err)}.verdict.passed{background:var(--ok)}
            .caveat{color:var(--mute);font-size:13px;margin:6px 0 0}
            .radio{position:absolute;left:-9999px}
            nav.filters{position:sticky;top:0;z-index:2;background:#fff;border-bottom:1px solid var(--line);padding:8px 28px;display:flex;flex-wrap:wrap;gap:6px 22px}
            nav.filters .group{display:flex;flex-wrap:wrap;gap:4px;align-items:center}
            nav.filters .gname{font-weight:600;margin-right:4px;color:var(--mute)}
            nav.filters label{cursor:pointer;border:1px solid var(--line);border-radius:12px;padding:1px 9px;font-size:13px;background:#fff}
            main{padding:10px 28px 40px}
            section.model{margin:18px 0 28px}
            section.model h2{font-size:19px;margin:0 0 8px;border-bottom:1px solid var(--line)}
            .cards{display:flex;flex-wrap:wrap;gap:12px;margin:8px 0 14px}
            .card{background:#fff;border:1px solid var(--line);border-radius:4px;padding:8px 12px;min-width:180px}
            .card .sub{margin:0 0 4px;font-size:13px;white-space:nowrap}
            .card h3{margin:0 0 4px;font-size:13px;text-transform:uppercase;letter-spacing:.05em;color:var(--mute)}
            table{border-collapse:collapse;font-size:13px}
            td,th{padding:2px 8px;text-align:left;border-bottom:1px solid #eee}
            td.n,th.n{text-align:right;font-variant-numeric:tabular-nums}
            .sev{font-weight:700;text-transform:uppercase;font-size:11px;padding:1px 6px;border-radius:3px;color:#fff;white-space:nowrap}
            .sev.error{background:var(--err)}.sev.warning{background:var(--warn);color:#1b1b1b}.sev.info{background:var(--info)}.sev.clean{background:var(--ok)}
            article.rxn{background:#fff;border:1px solid var(--line);border-left:6px solid var(--ok);border-radius:3px;margin:10px 0;padding:8px 14px}
            article.rxn.sev-error{border-left-color:var(--err)}article.rxn.sev-warning{border-left-color:var(--warn)}article.rxn.sev-info{border-left-color:var(--info)}
            article.rxn h4{margin:0;font-size:15px;display:flex;flex-wrap:wrap;gap:8px;align-items:baseline}
            .rid{font-family:ui-monospace,Menlo,Consolas,monospace}
            .rname{font-weight:400;color:var(--mute)}
            .tag{font-size:11px;border:1px solid var(--line);border-radius:3px;padding:0 5px;color:var(--mute);font-weight:400}
            .eq{margin:6px 0;font-size:14px}
            .eq code{font-size:11px;color:var(--mute)}
            .arrow{font-weight:700;padding:0 6px}
            .balance td.d.nz{font-weight:700;color:var(--err)}
            ul.findings{margin:6px 0;padding-left:0;list-style:none}
            ul.findings li{margin:2px 0}
            .rule{font-family:ui-monospace,Menlo,Consolas,monospace;font-size:12px;color:var(--mute)}
            .fix{border-left:3px solid var(--info);padding:2px 8px;background:#eef5fb;margin:6px 0}
            figure.pic{margin:8px 0;overflow-x:auto}
            figure.pic .pic{width:100%;background:#fff var(--pic) no-repeat center/contain}
            figure.pic figcaption{font-size:12px;color:var(--mute)}
            #show-idx:checked ~ main figure.pic .pic{background-image:var(--pic-idx)}
            article.rxn{content-visibility:auto;contain-intrinsic-size:auto 420px}
            #show-idx:checked ~ nav label[for=show-idx]{background:var(--ink);color:#fff}
            .nomap{color:var(--mute);font-size:13px;margin:4px 0}
            .lead-note{margin:6px 0 0;font-weight:600;color:var(--ink)}
            section.overview{padding:12px 28px 6px;background:#fff;border-bottom:1px solid var(--line)}
            section.overview h2{font-size:18px;margin:10px 0 6px}
            section.overview h2.fails{color:var(--err)}
            section.overview h2.passes{color:var(--ok)}
            section.overview h3{font-size:14px;margin:10px 0 2px;font-weight:600}
            section.overview h3 .count{color:var(--mute);font-weight:400}
            .causes{border-left:6px solid var(--warn);background:#fff8e6;padding:4px 12px;margin:6px 0 10px}
            .causes h2{margin:4px 0}
            .cause{margin:4px 0;font-size:15px}
            .links{margin:2px 0 6px;font-size:13px}
            .group.failing h3 .rule{color:var(--err)}
            ul.problems{margin:2px 0 4px;padding-left:18px;font-size:14px}
            ul.problems li{margin:1px 0}
            details.more summary,details.info-list summary{margin:2px 0}
            details.info-list{margin:10px 0 6px}
            .why{white-space:normal;color:var(--mute)}
            td.where{font-family:ui-monospace,Menlo,Consolas,monospace;font-size:12px;white-space:nowrap}
            ul.listed{columns:3 18em;font-size:12px;margin:4px 0}
            details summary{cursor:pointer;color:var(--mute);font-size:13px}
            """;

    /** The rules that make the radio buttons filter, for the values present in this report. */
    static String filters(List<String> severities, List<String> rules, List<String> statuses) {
        StringBuilder css = new StringBuilder();
        group(css, "sev", severities);
        group(css, "rule", rules);
        group(css, "st", statuses);
        return css.toString();
    }

    private static void group(StringBuilder css, String prefix, List<String> values) {
        css.append("#").append(prefix).append("-all:checked ~ nav label[for=").append(prefix)
                .append("-all]{background:var(--ink);color:#fff}\n");
        for (String v : values) {
            String id = prefix + "-" + v;
            css.append("#").append(id).append(":checked ~ main article.rxn:not(.").append(id).append("){display:none}\n");
            css.append("#").append(id).append(":checked ~ main .model-findings tr.mf:not(.").append(id).append("){display:none}\n");
            css.append("#").append(id).append(":checked ~ nav label[for=").append(id).append("]{background:var(--ink);color:#fff}\n");
        }
    }
}
