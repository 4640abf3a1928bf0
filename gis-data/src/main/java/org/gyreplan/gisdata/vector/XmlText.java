package org.gyreplan.gisdata.vector;

/** XML text and attribute escaping for the XML writers (GPX, KML). */
final class XmlText {
    private XmlText() {}

    static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length() + 8);
        for (int k = 0; k < s.length(); k++) {
            char c = s.charAt(k);
            switch (c) {
                case '<': b.append("&lt;"); break;
                case '>': b.append("&gt;"); break;
                case '&': b.append("&amp;"); break;
                case '"': b.append("&quot;"); break;
                case '\'': b.append("&apos;"); break;
                default:
                    if (c < 0x20 && c != '\n' && c != '\t' && c != '\r') b.append(' '); else b.append(c);
            }
        }
        return b.toString();
    }
}
