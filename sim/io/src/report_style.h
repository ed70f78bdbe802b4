#pragma once
// Internal to swarf_io: the inline style sheet of the HTML reports (report.html and
// compare.html), so that they look alike.
namespace swarf::io::detail {

/// The reports' CSS (inline, nothing from the network).
inline constexpr const char* kReportStyle =
    R"(body{font-family:sans-serif;max-width:1250px;margin:1em auto;padding:0 1em;color:#222}
h1{font-size:1.6em}h2{font-size:1.25em;border-bottom:1px solid #ccc;margin-top:1.6em}
table{border-collapse:collapse;margin:.5em 0}td,th{border:1px solid #ccc;padding:.25em .6em;text-align:left;vertical-align:top}
th{background:#f0f0f0}.num{text-align:right;font-variant-numeric:tabular-nums}
.ok{background:#e3f4e3;border:2px solid #3a3;padding:.6em 1em;font-size:1.3em}
.bad{background:#fbe4e4;border:2px solid #c33;padding:.6em 1em;font-size:1.3em}
.caution{background:#fff6d8;border:1px solid #d8b200;padding:.6em 1em}
figure{display:inline-block;margin:.5em;vertical-align:top}figure img{max-width:100%;border:1px solid #bbb}
figcaption{font-size:.9em;color:#444;max-width:600px})";

} // namespace swarf::io::detail
