// A printable document and its text and HTML renderings (see sheet_document.h).
#include "sheet_document.h"

#include "swarf/io/html.h"

#include <algorithm>
#include <sstream>

namespace swarf::io::detail {

namespace {

// Plain text: word-wrapped paragraphs and a column-aligned table.
std::string wrap(const std::string& text, const std::string& first, const std::string& rest,
                 std::size_t width = 98) {
    std::string out, line = first;
    std::istringstream words(text);
    std::string w;
    bool empty = true;
    while (words >> w) {
        if (!empty && line.size() + 1 + w.size() > width) {
            out += line + "\n";
            line = rest;
            empty = true;
        }
        line += (empty ? "" : " ") + w;
        empty = false;
    }
    return out + line + "\n";
}

// Display width of UTF-8 text (counts code points, not bytes).
std::size_t cols(const std::string& s) {
    std::size_t n = 0;
    for (unsigned char c : s)
        n += (c & 0xC0) != 0x80;
    return n;
}

std::string esc(const std::string& s) {
    return escapeHtml(s);
}

} // namespace

Block paragraph(std::string text) {
    return Block{Block::Kind::Para, {std::move(text)}, {}};
}

Block listBlock(std::vector<std::string> items, Block::Kind kind) {
    return Block{kind, std::move(items), {}};
}

Block tableBlock(Table table) {
    Block b;
    b.kind = Block::Kind::Table;
    b.table = std::move(table);
    return b;
}

std::string renderText(const Document& sh) {
    std::string out = sh.title + "\n" + std::string(cols(sh.title), '=') + "\n";
    if (!sh.subtitle.empty())
        out += sh.subtitle + "\n";
    for (const Section& s : sh.sections) {
        out += "\n" + s.title + "\n" + std::string(cols(s.title), '-') + "\n";
        for (const Block& b : s.blocks) {
            switch (b.kind) {
            case Block::Kind::Para:
                out += wrap(b.lines[0], "", "");
                break;
            case Block::Kind::List:
                for (const auto& l : b.lines)
                    out += wrap(l, "- ", "  ");
                break;
            case Block::Kind::Warn:
                for (const auto& l : b.lines)
                    out += wrap(l, "! ", "  ");
                break;
            case Block::Kind::Numbered:
                for (const auto& l : b.lines)
                    out += wrap(l, "", "    ");
                break;
            case Block::Kind::Table: {
                const Table& t = b.table;
                std::vector<std::size_t> w(t.head.size(), 0);
                for (std::size_t i = 0; i < t.head.size(); ++i)
                    w[i] = cols(t.head[i]);
                for (const auto& r : t.rows)
                    for (std::size_t i = 0; i < r.size(); ++i)
                        w[i] = std::max(w[i], cols(r[i]));
                auto row = [&](const std::vector<std::string>& r) {
                    std::string line;
                    for (std::size_t i = 0; i < r.size(); ++i)
                        line += r[i] + std::string(w[i] - cols(r[i]) + 2, ' ');
                    while (!line.empty() && line.back() == ' ')
                        line.pop_back();
                    return line + "\n";
                };
                out += "\n" + row(t.head);
                for (const auto& r : t.rows)
                    out += row(r);
                break;
            }
            }
        }
    }
    return out;
}

std::string renderHtml(const Document& sh) {
    std::string o =
        "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>" +
        esc(sh.title) +
        "</title>\n<style>\n"
        "body{font-family:sans-serif;font-size:10.5pt;margin:1.5em;max-width:60em;color:#111}\n"
        "h1{font-size:16pt;margin-bottom:0}h2{font-size:12.5pt;border-bottom:1px solid "
        "#888;margin-top:1.2em}\n"
        "table{border-collapse:collapse;font-size:9pt}td,th{border:1px solid #999;padding:2px "
        "5px;text-align:left;white-space:nowrap}\n"
        "th{background:#eee}.warn li{font-weight:bold}.warn{border:2px solid #000;padding:.4em "
        ".4em .4em 1.6em}\n"
        "ol.ops{list-style:none;padding-left:0}@page{size:auto;margin:12mm}\n"
        "@media print{body{margin:0}h2{break-after:avoid}table,li{break-inside:avoid}}\n"
        "</style></head><body>\n";
    o += "<h1>" + esc(sh.title) + "</h1>\n";
    if (!sh.subtitle.empty())
        o += "<p>" + esc(sh.subtitle) + "</p>\n";
    for (const Section& s : sh.sections) {
        o += "<h2>" + esc(s.title) + "</h2>\n";
        for (const Block& b : s.blocks) {
            switch (b.kind) {
            case Block::Kind::Para:
                o += "<p>" + esc(b.lines[0]) + "</p>\n";
                break;
            case Block::Kind::List:
            case Block::Kind::Warn:
            case Block::Kind::Numbered: {
                const char* open = b.kind == Block::Kind::Warn       ? "<ul class=\"warn\">"
                                   : b.kind == Block::Kind::Numbered ? "<ol class=\"ops\">"
                                                                     : "<ul>";
                o += std::string(open) + "\n";
                for (const auto& l : b.lines)
                    o += "<li>" + esc(l) + "</li>\n";
                o += b.kind == Block::Kind::Numbered ? "</ol>\n" : "</ul>\n";
                break;
            }
            case Block::Kind::Table:
                o += "<table>\n<tr>";
                for (const auto& h : b.table.head)
                    o += "<th>" + esc(h) + "</th>";
                o += "</tr>\n";
                for (const auto& r : b.table.rows) {
                    o += "<tr>";
                    for (const auto& c : r)
                        o += "<td>" + esc(c) + "</td>";
                    o += "</tr>\n";
                }
                o += "</table>\n";
                break;
            }
        }
    }
    return o + "</body></html>\n";
}

} // namespace swarf::io::detail
