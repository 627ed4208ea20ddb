package dev.soakfield.report;

import java.util.ArrayList;
import java.util.Base64;
import java.util.List;

/**
 * A report as a list of blocks (headings, paragraphs, tables, lists, pictures), rendered to a
 * self-contained HTML page (pictures inline as base64) or to Markdown (pictures as PNG files beside
 * it).
 */
public final class ReportDocument {
  private sealed interface Block {}

  private record Heading(int level, String text) implements Block {}

  private record Paragraph(String text) implements Block {}

  private record Table(List<String> header, List<List<String>> rows) implements Block {}

  private record Bullets(List<String> items) implements Block {}

  private record Preformatted(String text) implements Block {}

  @SuppressWarnings("ArrayRecordComponent") // private, copied in and out
  private record Picture(String file, String caption, byte[] png) implements Block {}

  private final String title;
  private final List<Block> blocks = new ArrayList<>();

  public ReportDocument(String title) {
    this.title = title;
  }

  public ReportDocument heading(String text) {
    blocks.add(new Heading(2, text));
    return this;
  }

  public ReportDocument paragraph(String text) {
    blocks.add(new Paragraph(text));
    return this;
  }

  public ReportDocument table(List<String> header, List<List<String>> rows) {
    for (List<String> r : rows) {
      if (r.size() != header.size()) {
        throw new IllegalArgumentException(r.size() + " cells for " + header.size() + " columns");
      }
    }
    blocks.add(new Table(List.copyOf(header), rows.stream().map(List::copyOf).toList()));
    return this;
  }

  public ReportDocument bullets(List<String> items) {
    blocks.add(new Bullets(List.copyOf(items)));
    return this;
  }

  public ReportDocument preformatted(String text) {
    blocks.add(new Preformatted(text));
    return this;
  }

  /** A picture: inline in HTML, the file {@code file} beside the Markdown. */
  public ReportDocument picture(String file, String caption, byte[] png) {
    blocks.add(new Picture(file, caption, png.clone()));
    return this;
  }

  /** The pictures with the file names the Markdown links to. */
  public List<String> pictureFiles() {
    List<String> out = new ArrayList<>();
    for (Block b : blocks) {
      if (b instanceof Picture p) {
        out.add(p.file());
      }
    }
    return out;
  }

  /** The bytes of picture {@code file}. */
  public byte[] pictureBytes(String file) {
    for (Block b : blocks) {
      if (b instanceof Picture p && p.file().equals(file)) {
        return p.png().clone();
      }
    }
    throw new IllegalArgumentException("no picture " + file);
  }

  /** One HTML page, no external resources. */
  public String toHtml() {
    StringBuilder sb = new StringBuilder();
    sb.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
    sb.append("<title>").append(html(title)).append("</title>\n");
    sb.append(
        "<style>body{font-family:sans-serif;max-width:60em;margin:2em auto;padding:0 1em;"
            + "line-height:1.4}table{border-collapse:collapse;margin:.5em 0}"
            + "td,th{border:1px solid #999;padding:.2em .6em;text-align:left}"
            + "th{background:#eee}img{max-width:100%}pre{background:#f6f6f6;padding:.5em;"
            + "overflow:auto}.caution{border-left:4px solid #b00;padding-left:1em}</style>\n");
    sb.append("</head>\n<body>\n<h1>").append(html(title)).append("</h1>\n");
    for (Block b : blocks) {
      if (b instanceof Heading h) {
        sb.append("<h2>").append(html(h.text())).append("</h2>\n");
      } else if (b instanceof Paragraph p) {
        sb.append("<p>").append(html(p.text())).append("</p>\n");
      } else if (b instanceof Table t) {
        sb.append("<table>\n<tr>");
        t.header().forEach(c -> sb.append("<th>").append(html(c)).append("</th>"));
        sb.append("</tr>\n");
        for (List<String> r : t.rows()) {
          sb.append("<tr>");
          r.forEach(c -> sb.append("<td>").append(html(c)).append("</td>"));
          sb.append("</tr>\n");
        }
        sb.append("</table>\n");
      } else if (b instanceof Bullets l) {
        sb.append("<ul>\n");
        l.items().forEach(i -> sb.append("<li>").append(html(i)).append("</li>\n"));
        sb.append("</ul>\n");
      } else if (b instanceof Preformatted p) {
        sb.append("<pre>").append(html(p.text())).append("</pre>\n");
      } else if (b instanceof Picture p) {
        sb.append("<figure><img alt=\"")
            .append(html(p.caption()))
            .append("\" src=\"data:image/png;base64,")
            .append(Base64.getEncoder().encodeToString(p.png()))
            .append("\"><figcaption>")
            .append(html(p.caption()))
            .append("</figcaption></figure>\n");
      }
    }
    return sb.append("</body>\n</html>\n").toString();
  }

  /** Markdown linking to the pictures as files beside it. */
  public String toMarkdown() {
    StringBuilder sb = new StringBuilder("# ").append(title).append("\n\n");
    for (Block b : blocks) {
      if (b instanceof Heading h) {
        sb.append("## ").append(h.text()).append("\n\n");
      } else if (b instanceof Paragraph p) {
        sb.append(p.text()).append("\n\n");
      } else if (b instanceof Table t) {
        sb.append(mdRow(t.header()));
        sb.append("|").append(" --- |".repeat(t.header().size())).append('\n');
        t.rows().forEach(r -> sb.append(mdRow(r)));
        sb.append('\n');
      } else if (b instanceof Bullets l) {
        l.items().forEach(i -> sb.append("- ").append(i).append('\n'));
        sb.append('\n');
      } else if (b instanceof Preformatted p) {
        sb.append("```\n").append(p.text()).append("\n```\n\n");
      } else if (b instanceof Picture p) {
        sb.append("![").append(p.caption()).append("](").append(p.file()).append(")\n\n");
      }
    }
    return sb.toString();
  }

  private static String mdRow(List<String> cells) {
    StringBuilder sb = new StringBuilder("|");
    for (String c : cells) {
      sb.append(' ').append(c.replace("|", "\\|")).append(" |");
    }
    return sb.append('\n').toString();
  }

  static String html(String s) {
    return s.replace("&", "&amp;")
        .replace("<", "&lt;")
        .replace(">", "&gt;")
        .replace("\"", "&quot;");
  }
}
