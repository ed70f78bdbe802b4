// The set-up sheet's order of operations (see sheet_sections.h): each pass with the way there
// and back in handwheel numbers, which way the tool feeds and which edge cuts, and the handwheel
// pace of a hand-fed pass.
#include "sheet_sections.h"

#include "swarf/sim/compound_sense.h"
#include "swarf/sim/machine.h"

#include <cmath>
#include <cstdio>
#include <vector>

namespace swarf::io::detail {
namespace {

const char* slideWord(SlideName s) {
    return s == SlideName::Cross ? "cross-slide" : s == SlideName::Compound ? "compound" : "saddle";
}

// The reading of a slide at the end of a move, as the sheet shows it in a stage.
struct Shown {
    const SheetCtx& c;
    double crossOff = 0, saddleOff = 0;
    const Slide& slide(SlideName s) const {
        return s == SlideName::Cross      ? c.su.cross
               : s == SlideName::Compound ? c.su.compound
                                          : c.su.saddle;
    }
    std::string to(const BetweenMove& m) const {
        const double v = m.slide == SlideName::Cross      ? m.move.crossTo + crossOff
                         : m.slide == SlideName::Compound ? m.move.compoundTo
                                                          : m.move.saddleTo + saddleOff;
        return dialCell(slide(m.slide), v, c.u);
    }
};

Shown shownIn(const SheetCtx& c, int pass) {
    Shown s{c};
    if (pass >= 0 && c.plan.display[static_cast<std::size_t>(pass)].stage == 0) {
        s.crossOff = c.plan.stage0CrossOffsetMm;
        s.saddleOff = c.plan.stage0SaddleOffsetMm;
    }
    return s;
}

// The moves that bring the tool to pass k's start, in words.
std::string wayThere(const SheetCtx& c, const std::vector<BetweenMove>& between, int k) {
    const Shown sh = shownIn(c, k);
    std::vector<std::string> parts;
    bool first = true;
    // After the dials were set again (a new stage), the tool is backed out in the new numbers
    // before it goes anywhere: the touch-off left it on the work.
    const int prev = k - 1;
    if (prev >= 0 && c.plan.display[static_cast<std::size_t>(prev)].stage !=
                         c.plan.display[static_cast<std::size_t>(k)].stage)
        for (const BetweenMove& m : between)
            if (m.afterPass == prev && m.beforePass == k && m.step == ReturnStep::BackOut)
                parts.push_back(std::string(c.plan.inside
                                                ? "after touching off, bring the bar off the "
                                                  "wall to "
                                                : "after touching off, back the cross-slide out "
                                                  "to ") +
                                sh.to(m));
    for (std::size_t i = 0; i < between.size(); ++i) {
        const BetweenMove& m = between[i];
        if (m.beforePass != k || m.step == ReturnStep::BackOut)
            continue;
        if (m.afterPass < 0 && first)
            parts.push_back(c.plan.inside ? "bring the bar into the hole, off its wall, in front "
                                            "of the mouth"
                                          : "bring the tool to the start, clear of the bar");
        first = false;
        switch (m.step) {
        case ReturnStep::WindBack: {
            std::string t = std::string("wind the ") + slideWord(m.slide) + " back to " + sh.to(m);
            if (i + 1 < between.size() && between[i + 1].step == ReturnStep::BringUp &&
                between[i + 1].slide == m.slide) {
                t += " and forward to " + sh.to(between[i + 1]);
                ++i;
            }
            parts.push_back(t);
            break;
        }
        case ReturnStep::BringUp:
            parts.push_back(std::string("wind the ") + slideWord(m.slide) + " forward to " +
                            sh.to(m));
            break;
        case ReturnStep::Dial:
            parts.push_back(std::string("dial the ") + slideWord(m.slide) + " to " + sh.to(m));
            break;
        case ReturnStep::FeedIn:
            parts.push_back(std::string(c.plan.inside ? "feed the cross-slide out to "
                                                      : "feed the cross-slide in to ") +
                            sh.to(m));
            break;
        case ReturnStep::BackOut:
            break;
        }
    }
    std::string s;
    for (std::size_t i = 0; i < parts.size(); ++i)
        s += (i ? "; " : "") + parts[i];
    return s;
}

std::string backOutAfter(const SheetCtx& c, const std::vector<BetweenMove>& between, int k) {
    for (const BetweenMove& m : between)
        if (m.afterPass == k && m.step == ReturnStep::BackOut)
            return shownIn(c, k).to(m);
    return "";
}

std::string pace(const SheetCtx& c, const Pass& p) {
    if (p.kind != PassKind::Compound)
        return "";
    const double tpm = handwheelTurnsPerMinute(c.su, p);
    if (!(tpm > 0))
        return "";
    char buf[96];
    if (tpm >= 2)
        std::snprintf(buf, sizeof buf, " (by hand: about %.0f turns a minute at %.0f rev/min)", tpm,
                      *c.su.spindleRpm);
    else
        std::snprintf(buf, sizeof buf, " (by hand: one turn about every %.0f s at %.0f rev/min)",
                      60.0 / tpm, *c.su.spindleRpm);
    return buf;
}

} // namespace

Section operationsSection(const SheetCtx& c) {
    const ConePlan& plan = c.plan;
    const Setup& su = c.su;
    const Units u = c.u;
    const std::vector<BetweenMove> between = betweenPassMoves(c.sc);
    std::vector<std::string> numbered;
    Table passes;
    const std::string un = unitName(u);
    passes.head = {"step",
                   "pass",
                   "readings from",
                   "slide that moves",
                   "cross-slide " + un,
                   "compound " + un,
                   "saddle " + un,
                   "from",
                   "to",
                   "feed " + un + "/rev",
                   plan.inside ? "off the wall to" : "back out to"};
    // Stages are named only when there are two (straight passes before the references).
    bool twoStages = false;
    for (const PassDisplay& d : plan.display)
        twoStages = twoStages || d.stage == 0;
    int stepNo = 0;
    for (const PlanStep& st : plan.steps) {
        ++stepNo;
        if (st.kind != PlanStep::Kind::Pass) {
            numbered.push_back(std::to_string(stepNo) + ". " + st.text);
            continue;
        }
        const int k = st.pass;
        const Pass& p = c.sc.plan.passes[static_cast<std::size_t>(k)];
        const PassDisplay& d = plan.display[static_cast<std::size_t>(k)];
        const double cOff = d.stage == 0 ? plan.stage0CrossOffsetMm : 0.0;
        const double sOff = d.stage == 0 ? plan.stage0SaddleOffsetMm : 0.0;
        const bool mC = p.kind == PassKind::CrossSlide, mP = p.kind == PassKind::Compound,
                   mS = p.kind == PassKind::Saddle;
        const Slide& moving = mC ? su.cross : mP ? su.compound : su.saddle;
        const double off = mC ? cOff : mS ? sOff : 0.0;
        std::string locked;
        if (!mC)
            locked += "cross-slide " + dialCell(su.cross, p.crossMm + cOff, u);
        if (!mP)
            locked += std::string(locked.empty() ? "" : ", ") + "compound " +
                      dialCell(su.compound, p.compoundMm, u);
        if (!mS)
            locked += std::string(locked.empty() ? "" : ", ") + "saddle " +
                      dialCell(su.saddle, p.saddleMm + sOff, u);
        const std::string there = wayThere(c, between, k);
        const std::string back = backOutAfter(c, between, k);
        const std::string stage = d.stage == 0 ? "first touch-off" : "the references";
        std::string line = std::to_string(stepNo) + ". Pass " + std::to_string(k + 1) +
                           (twoStages ? " (readings from " + stage + ")" : std::string()) + ": " +
                           p.note + ". It " + feedDirectionWords(passFeedDirection(c.sc, p)) + ".";
        if (!there.empty())
            line += " To the start: " + there + ".";
        line += " Locked: " + locked + ". Wind the " + passKindName(p.kind) + " from " +
                dialCell(moving, p.fromMm + off, u) + " to " + dialCell(moving, p.toMm + off, u) +
                " at " + c.feed(p.feedMmPerRev) + " " + un + "/rev" + pace(c, p) + ".";
        if (!back.empty())
            line += (c.plan.inside ? " Then bring the bar off the wall to "
                                   : " Then back the cross-slide out to ") +
                    back + ".";
        numbered.push_back(line);
        passes.rows.push_back({std::to_string(stepNo), std::to_string(k + 1),
                               twoStages ? stage : "", passKindName(p.kind),
                               mC ? "moves" : dialCell(su.cross, p.crossMm + cOff, u),
                               mP ? "moves" : dialCell(su.compound, p.compoundMm, u),
                               mS ? "moves" : dialCell(su.saddle, p.saddleMm + sOff, u),
                               dialCell(moving, p.fromMm + off, u),
                               dialCell(moving, p.toMm + off, u), c.feed(p.feedMmPerRev), back});
    }
    // The key to the readings right under the table that uses it.
    const std::string key =
        "In the table: a reading n.nnn [n t + d] is n whole turns of the handwheel from zero "
        "(negative: back from zero), then division d on the dial, which wraps every turn; "
        "\"moves\" marks the slide that moves during the pass, the others stay locked at their "
        "readings" +
        std::string(twoStages ? "; \"readings from\" says which zero they count from (the first "
                                "touch-off on the bar, or the references)"
                              : "") +
        ".";
    return {"Order of operations",
            {listBlock(numbered, Block::Kind::Numbered), tableBlock(passes), paragraph(key)}};
}

} // namespace swarf::io::detail
