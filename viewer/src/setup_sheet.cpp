// The set-up sheet: one document model, rendered as plain text or as HTML.
#include "swarf/viewer/setup_sheet.h"

#include "swarf/viewer/moment.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <sstream>
#include <vector>

namespace swarf::viewer {
namespace {

// The sheet as sections of paragraphs, lists and tables, before rendering.
struct Table {
    std::vector<std::string> head;
    std::vector<std::vector<std::string>> rows;
};
struct Block {
    enum class Kind { Para, List, Numbered, Table, Warn } kind = Kind::Para;
    std::vector<std::string> lines;
    Table table;
};
struct Section {
    std::string title;
    std::vector<Block> blocks;
};
struct Sheet {
    std::string title, subtitle;
    std::vector<Section> sections;
};

std::string printf1(const char* f, double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, f, v);
    return buf;
}

Block para(std::string s) {
    return Block{Block::Kind::Para, {std::move(s)}, {}};
}
Block list(std::vector<std::string> l, Block::Kind k = Block::Kind::List) {
    return Block{k, std::move(l), {}};
}

const char* kCautions[] = {
    "Keep every guard in place and closed. Take the chuck key out of the chuck every time, before "
    "the spindle is started.",
    "No gloves, loose sleeves, ties, jewellery or long loose hair near rotating work. Wear eye "
    "protection. Clear swarf with a brush or hook, never by hand, and only with the spindle "
    "stopped.",
    "Keep the work's stick-out short (about three diameters or less in a chuck alone) or support "
    "it "
    "with the tailstock; check the work is held tight before starting.",
    "Take cutting speeds, feeds and depths of cut from the tooling supplier's data for this insert "
    "and material; the feeds here are the plan's inputs, not a recommendation.",
    "Defer to your shop's rules, local codes and licensed practice; this sheet does not replace "
    "training or supervision.",
    "The simulation behind this sheet models the tool path and the insert's shape only. It does "
    "not "
    "model cutting forces, deflection of the work or the tool, chatter or tool wear. Check every "
    "reading on the machine and take a light trial cut before trusting any number here.",
};

// A compact table cell: "-13.950 [-7 t + 2.5]" (value in the scene's units, turns, division).
std::string cell(const Slide& slide, double readingMm, Units u) {
    const DialSetting d = dialSetting(slide, readingMm);
    const double frac = d.division - std::floor(d.division);
    char buf[96];
    std::snprintf(buf, sizeof buf, "%.*f\u00a0[%ld\u00a0t\u00a0+\u00a0%.*f]",
                  u == Units::Inch ? 4 : 3, fromMm(readingMm, u), d.turns,
                  frac < 1e-6 || frac > 1 - 1e-6 ? 0 : 1, d.division);
    return buf;
}

Sheet buildSheet(const ConePlan& plan, const CutResult* proof) {
    const Scene& sc = plan.scene;
    const Units u = sc.units;
    const Setup& su = sc.setup;
    auto L = [u](double mm, int digits = -1) { return formatLength(mm, u, digits); };
    Sheet sh;
    sh.title = "Set-up sheet: " + sc.name;
    sh.subtitle = sc.description;

    Section safety{"Safety first", {}};
    safety.blocks.push_back(list(
        std::vector<std::string>(std::begin(kCautions), std::end(kCautions)), Block::Kind::Warn));
    sh.sections.push_back(safety);

    if (!plan.planned) {
        Section no{"No plan", {}};
        no.blocks.push_back(list(plan.problems));
        if (!plan.suggestions.empty()) {
            no.blocks.push_back(para("Inserts and holders that can follow this cone:"));
            no.blocks.push_back(list(plan.suggestions));
        }
        sh.sections.push_back(no);
        return sh;
    }

    const Feature& f = sc.part.features[plan.featureIndex];
    const Cone& cone = f.cone;
    Section job{"The job", {}};
    std::vector<std::string> jl;
    jl.push_back("Cone '" + f.name + "': Ø" + L(cone.gaugeDiameterMm) + " ± " + L(f.toleranceMm) +
                 " at the gauge plane " + L(cone.gaugeZMm) + " from the datum face; from " +
                 L(f.zStartMm) + " to " + L(f.zEndMm) + ", widening toward the " +
                 (cone.widens == Widens::TowardChuck ? "chuck" : "tailstock") + ".");
    jl.push_back("Half angle θ = " + formatDms(plan.halfAngleRad, 1) + " (included " +
                 formatDms(2 * plan.halfAngleRad, 1) +
                 "; taper 1:" + printf1("%.3f", cone.ratioK()) + " on diameter), ± " +
                 formatDms(f.angleToleranceRad, 0) + ".");
    jl.push_back("Bar Ø" + L(sc.stock.diameterMm) + ", " + L(sc.stock.stickOutMm) +
                 " out of the jaws" + (sc.stock.material.empty() ? "" : ", " + sc.stock.material) +
                 ".");
    jl.push_back(
        std::string("Insert shape ") + (sc.tool.shape ? std::string(1, sc.tool.shape) : "?") +
        ", nose radius " + L(sc.tool.noseRadiusMm) + ", entering angle " +
        formatDms(sc.tool.enteringAngleRad, 0) +
        (sc.tool.holderCode.empty() ? "" : " (holder style " + sc.tool.holderCode + ")") +
        ", hand " +
        (sc.tool.hand == Hand::L   ? "L"
         : sc.tool.hand == Hand::N ? "N"
                                   : "R") +
        ", tip " +
        (sc.tool.tipHeightMm == 0 ? "on centre" : L(sc.tool.tipHeightMm) + " off centre") + ".");
    jl.push_back(std::string("Cross-slide dial reads on ") +
                 (su.crossDial == DialMode::Diameter ? "diameter" : "radius") + ", " +
                 L(su.cross.mmPerDivision) + " per division, " +
                 std::to_string(su.cross.divisionsPerTurn) + " divisions a turn; compound " +
                 L(su.compound.mmPerDivision) + " per division, " +
                 std::to_string(su.compound.divisionsPerTurn) + " a turn; saddle " +
                 L(su.saddle.mmPerDivision) + " per division, " +
                 std::to_string(su.saddle.divisionsPerTurn) + " a turn.");
    if (su.spindleRpm)
        jl.push_back("Spindle " + printf1("%.0f", *su.spindleRpm) +
                     " rev/min (check it against the supplier's data).");
    job.blocks.push_back(list(jl));
    sh.sections.push_back(job);

    Section setting{"Compound and nose-radius offset", {}};
    std::vector<std::string> cl;
    cl.push_back("Compound on its scale: " + formatDms(plan.compoundReadingRad, 0) +
                 (su.compoundScale == CompoundScale::FromAxis
                      ? " (scale read from the spindle axis)"
                      : " (scale read from the cross-slide: 90° − θ)") +
                 "; winding it in moves the tool toward the " +
                 (su.compoundAdvanceToward == Widens::TowardChuck ? "chuck" : "tailstock") + ".");
    {
        std::string s = "Sine bar " + L(plan.sineBar.barLengthMm) + " at " +
                        formatDms(plan.sineBar.angleRad, 1) + ": gauge stack " +
                        L(plan.sineBar.stackMm, u == Units::Inch ? 5 : 4);
        auto blocks = [&](const std::vector<double>& b) {
            std::string t;
            for (std::size_t i = 0; i < b.size(); ++i)
                t += (i ? " + " : "") + L(b[i], u == Units::Inch ? 4 : 3);
            return t;
        };
        if (!plan.sineBar.blocksMm.empty() && plan.sineBar.baseBlocksMm.empty())
            s += " = " + blocks(plan.sineBar.blocksMm);
        else if (!plan.sineBar.blocksMm.empty())
            s += ", too short to build alone: stand the raised roll on " +
                 blocks(plan.sineBar.blocksMm) + " and the other roll on " +
                 blocks(plan.sineBar.baseBlocksMm);
        else
            s += " (the gauge block set cannot build it: use the nearest stack and note the "
                 "angle it gives)";
        s +=
            ". Lay the bar at that angle to a reference trued parallel to the spindle axis, run an "
            "indicator on the compound along it, and swivel the compound until the reading stays "
            "put.";
        cl.push_back(s);
    }
    cl.push_back(
        "Nose-radius offset (plane geometry): a tip placed on the drawn cone line "
        "would leave " +
        formatSmallLength(plan.noseNormalErrorMm, u) +
        " normal to the cone; the finishing readings already include the offset (tip line " +
        L(std::fabs(plan.noseOffsetRadialMm), u == Units::Inch ? 5 : 4) + " on radius " +
        (plan.noseOffsetRadialMm < 0 ? "inside" : "outside") + " the drawn line, the same as " +
        L(std::fabs(plan.noseOffsetAxialMm), u == Units::Inch ? 5 : 4) + " along the axis).");
    setting.blocks.push_back(list(cl));
    sh.sections.push_back(setting);

    Section refs{"References and readings", {}};
    refs.blocks.push_back(para(
        "Readings are dial readings in " + std::string(unitName(u)) +
        "; in the table, [n t + d] means n whole turns from zero (negative: back from zero), then "
        "division d on the dial, which wraps every turn. Approach every reading "
        "in its increasing direction (cross-slide: in toward the centre; compound: in; saddle: "
        "toward the chuck): wind back past it, then forward to it. The readings then need no "
        "backlash correction. Lock the slides that do not move during a pass."));
    refs.blocks.push_back(para(
        "Stage A readings count from the first touch-off on the bar (Ø" + L(sc.stock.diameterMm) +
        ") and its end face. Stage B readings count from the references: the cross-slide reads 0 "
        "at Ø" +
        L(su.zeroDiameterMm) + ", the saddle reads 0 with the tip at " + L(su.zeroZMm) +
        " from the datum face."));
    sh.sections.push_back(refs);

    Section ops{"Order of operations", {}};
    std::vector<std::string> numbered;
    Table passes;
    const std::string un = unitName(u);
    passes.head = {"step",           "pass",         "stage", "moves", "cross-slide " + un,
                   "compound " + un, "saddle " + un, "from",  "to",    "feed " + un + "/rev"};
    int stepNo = 0;
    for (const PlanStep& st : plan.steps) {
        ++stepNo;
        if (st.kind != PlanStep::Kind::Pass) {
            numbered.push_back(std::to_string(stepNo) + ". " + st.text);
            continue;
        }
        const Pass& p = sc.plan.passes[st.pass];
        const PassDisplay& d = plan.display[st.pass];
        const double cOff = d.stage == 0 ? plan.stage0CrossOffsetMm : 0.0;
        const double sOff = d.stage == 0 ? plan.stage0SaddleOffsetMm : 0.0;
        const bool mC = p.kind == PassKind::CrossSlide, mP = p.kind == PassKind::Compound,
                   mS = p.kind == PassKind::Saddle;
        const Slide& moving = mC ? su.cross : mP ? su.compound : su.saddle;
        const double off = mC ? cOff : mS ? sOff : 0.0;
        // The readings in words too, so the line can be followed without the table.
        std::string locked;
        if (!mC)
            locked += "cross-slide " + cell(su.cross, p.crossMm + cOff, u);
        if (!mP)
            locked += std::string(locked.empty() ? "" : ", ") + "compound " +
                      cell(su.compound, p.compoundMm, u);
        if (!mS)
            locked += std::string(locked.empty() ? "" : ", ") + "saddle " +
                      cell(su.saddle, p.saddleMm + sOff, u);
        numbered.push_back(std::to_string(stepNo) + ". Pass " + std::to_string(st.pass + 1) +
                           " (stage " + (d.stage == 0 ? "A" : "B") + "): " + p.note + ". Set " +
                           locked + "; wind the " + passKindName(p.kind) + " from " +
                           cell(moving, p.fromMm + off, u) + " to " +
                           cell(moving, p.toMm + off, u) + " at " +
                           printf1(u == Units::Inch ? "%.4f" : "%.3f", fromMm(p.feedMmPerRev, u)) +
                           " " + unitName(u) + "/rev.");
        passes.rows.push_back(
            {std::to_string(stepNo), std::to_string(st.pass + 1), d.stage == 0 ? "A" : "B",
             passKindName(p.kind), mC ? "moves" : cell(su.cross, p.crossMm + cOff, u),
             mP ? "moves" : cell(su.compound, p.compoundMm, u),
             mS ? "moves" : cell(su.saddle, p.saddleMm + sOff, u), cell(moving, p.fromMm + off, u),
             cell(moving, p.toMm + off, u),
             printf1(u == Units::Inch ? "%.4f" : "%.3f", fromMm(p.feedMmPerRev, u))});
    }
    ops.blocks.push_back(list(numbered, Block::Kind::Numbered));
    Block tb;
    tb.kind = Block::Kind::Table;
    tb.table = passes;
    ops.blocks.push_back(tb);
    sh.sections.push_back(ops);

    Section checks{"Checks before the finishing pass", {}};
    checks.blocks.push_back(list({
        "Diameter at " + L(plan.checkZMm) + " from the datum face: Ø" +
            L(plan.checkDiameterRoughMm) + " before finishing, Ø" +
            L(plan.checkDiameterFinishedMm) + " finished.",
        "Over two Ø" + L(plan.rolls.rollDiameterMm) + " rolls, roll centres at " +
            L(plan.rolls.z1Mm) + " and " + L(plan.rolls.z2Mm) + " from the datum face (" +
            L(plan.rolls.height1Mm) + " and " + L(plan.rolls.height2Mm) +
            " from the cone's small end): before finishing " +
            L(plan.rolls.reading1Mm + plan.rolls.roughExtraMm) + " and " +
            L(plan.rolls.reading2Mm + plan.rolls.roughExtraMm) + "; finished " +
            L(plan.rolls.reading1Mm) + " and " + L(plan.rolls.reading2Mm) + ". The difference, " +
            L(plan.rolls.reading2Mm - plan.rolls.reading1Mm) + ", checks the angle at any size.",
        "Compound angle with the sine bar stack above, before the first cone pass.",
    }));
    sh.sections.push_back(checks);

    Section finish{"Expected finish", {}};
    finish.blocks.push_back(para(
        "Finishing pass at " +
        formatLength(sc.planning.finishFeedMmPerRev, u, u == Units::Inch ? 4 : 3) + "/rev with a " +
        L(sc.tool.noseRadiusMm) + " nose: theoretical Rt " + formatSmallLength(plan.rtMm, u) +
        ", Ra " + formatSmallLength(plan.raMm, u) +
        " (from feed and nose radius only; the real finish also depends on the material, the edge, "
        "speed and rigidity)."));
    sh.sections.push_back(finish);

    if (!plan.cautions.empty()) {
        Section c{"Notes for this job", {}};
        c.blocks.push_back(list(plan.cautions, Block::Kind::Warn));
        sh.sections.push_back(c);
    }
    if (proof) {
        Section pr{"The plan, simulated", {}};
        std::vector<std::string> l;
        l.push_back(std::string("Verdict: ") +
                    (proof->withinTolerance ? "within tolerance" : "OUT OF TOLERANCE") + ".");
        l.push_back("Gauge diameter as cut Ø" + L(proof->gaugeAsCutDiameterMm) + " (drawing Ø" +
                    L(proof->gaugeNominalDiameterMm) + "); most metal left on " +
                    formatSmallLength(proof->maxLeftOnMm, u) + ", deepest overcut " +
                    formatSmallLength(proof->maxOvercutMm, u) + ".");
        for (const Finding& fd : proof->findings)
            l.push_back(std::string(findingKindName(fd.kind)) + " (pass " +
                        std::to_string(fd.pass + 1) + "): " + fd.message);
        if (proof->findings.empty())
            l.push_back("No findings.");
        pr.blocks.push_back(list(l));
        sh.sections.push_back(pr);
    }
    return sh;
}

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

std::string renderText(const Sheet& sh) {
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

std::string esc(const std::string& s) {
    std::string o;
    for (char c : s) {
        switch (c) {
        case '&':
            o += "&amp;";
            break;
        case '<':
            o += "&lt;";
            break;
        case '>':
            o += "&gt;";
            break;
        case '"':
            o += "&quot;";
            break;
        default:
            o += c;
        }
    }
    return o;
}

std::string renderHtml(const Sheet& sh) {
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

} // namespace

std::string dialReadingText(const Slide& slide, double readingMm, Units units) {
    const DialSetting d = dialSetting(slide, readingMm);
    // Whole divisions print without decimals; half divisions with one.
    const double frac = d.division - std::floor(d.division);
    const std::string div =
        printf1(std::fabs(frac) < 1e-6 || std::fabs(frac - 1) < 1e-6 ? "%.0f" : "%.1f", d.division);
    return formatLength(readingMm, units) + " (" + std::to_string(d.turns) + " turns + " + div +
           " div)";
}

std::string setupSheetText(const ConePlan& plan, const CutResult* proof) {
    return renderText(buildSheet(plan, proof));
}

std::string setupSheetHtml(const ConePlan& plan, const CutResult* proof) {
    return renderHtml(buildSheet(plan, proof));
}

} // namespace swarf::viewer
