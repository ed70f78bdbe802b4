// swarf check SCENE: read and validate a scene, then print what was understood, in the scene's
// units. Exit 0 on a good scene; a bad one throws InputError (exit 2, message on stderr).
#include "commands.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/compound_sense.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/error.h"
#include "swarf/sim/iso2768.h"
#include "swarf/sim/scene_notes.h"

#include <fmt/core.h>

#include <cmath>
#include <string>

namespace swarf::app {

namespace {

std::string len(double mm, Units u) {
    return formatLength(mm, u);
}

// A tolerance: in inch scenes also in thou, as the trade reads it.
std::string tol(double mm, Units u) {
    return u == Units::Inch ? formatLength(mm, u) + " (" + formatSmallLength(mm, u) + ")"
                            : formatLength(mm, u);
}

std::string deg(double rad) {
    return fmt::format("{:.4f}° ({})", radToDeg(rad), formatDms(rad));
}

std::string slideText(const Slide& s, Units u) {
    std::string t = fmt::format("{} per division, {} divisions a turn, backlash {}",
                                formatLength(s.mmPerDivision, u, Precision::Normal),
                                s.divisionsPerTurn, len(s.backlashMm, u));
    if (s.travelMm < 1e8)
        t += ", travel " + len(s.travelMm, u);
    return t;
}

void printCone(const Feature& f, Units u, Iso2768 cls) {
    const Cone& c = f.cone;
    fmt::print("      gauge plane z = {}, gauge diameter {} ± {} ({})\n", len(c.gaugeZMm, u),
               len(c.gaugeDiameterMm, u), tol(f.toleranceMm, u),
               f.toleranceFromClass ? std::string("ISO 2768-") + iso2768Name(cls) : "given");
    fmt::print("      half angle {}, included angle {}\n", deg(c.halfAngleRad),
               deg(c.includedAngleRad()));
    fmt::print("      ratio 1:{:.4f}, taper per foot {:.5f} in/ft, rate C = {:.6f} on diameter\n",
               c.ratioK(), c.taperPerFootIn(), c.taperRate());
    fmt::print("      widens toward the {}; diameter {} at z = {}, {} at z = {}\n",
               c.widens == Widens::TowardChuck ? "chuck" : "tailstock",
               len(c.diameterAt(f.zStartMm), u), len(f.zStartMm, u), len(c.diameterAt(f.zEndMm), u),
               len(f.zEndMm, u));
    fmt::print("      angle tolerance ± {} on the half angle ({})\n", deg(f.angleToleranceRad),
               f.angleToleranceFromClass ? std::string("ISO 2768-") + iso2768Name(cls) : "given");
    fmt::print("      given as: {}\n", f.coneGivenAs);
}

// Things worth a second look that are not errors (sim/scene_notes.h): the scene is still valid.
void printNotes(const Scene& s) {
    for (const auto& n : sceneNotes(s))
        fmt::print("note: {}\n", n);
}

void printScene(const Scene& s) {
    const Units u = s.units;
    fmt::print("scene: {} ({})\n", s.name, s.file);
    if (!s.description.empty())
        fmt::print("  {}\n", s.description);
    fmt::print("units: {}\n", unitWord(u));
    const Stock& st = s.stock;
    fmt::print(
        "stock: bar {} diameter, {} long, sticks out {} from the jaws ({:.1f} diameters){}\n",
        len(st.diameterMm, u), len(st.lengthMm, u), len(st.stickOutMm, u),
        st.stickOutMm / st.diameterMm,
        st.tailstockSupport ? ", tailstock centre" : ", no tailstock");
    fmt::print("       face allowance {}, material: {}\n", len(st.faceAllowanceMm, u),
               st.material.empty() ? "(not given)" : st.material);
    if (st.hasBore())
        fmt::print("       hole {} diameter, {} deep from the free end ({}; bottom at z = {})\n",
                   len(st.boreDiameterMm, u), len(st.boreDepthMm, u),
                   st.boreThrough() ? "through the work" : "blind", len(st.boreBottomZMm(), u));
    fmt::print("part: {} feature(s), general tolerances ISO 2768-{}\n", s.part.features.size(),
               iso2768Name(s.part.toleranceClass));
    int i = 0;
    for (const Feature& f : s.part.features) {
        ++i;
        const std::string side = f.side == Side::Inside ? "inside " : "";
        switch (f.kind) {
        case FeatureKind::Cylinder:
            fmt::print("  [{}] {}cylinder \"{}\": z {} to {}, diameter {} ± {} ({})\n", i, side,
                       f.name, len(f.zStartMm, u), len(f.zEndMm, u), len(f.diameterMm, u),
                       tol(f.toleranceMm, u), f.toleranceFromClass ? "ISO 2768" : "given");
            break;
        case FeatureKind::Cone:
            fmt::print("  [{}] {}cone \"{}\": z {} to {}\n", i, side, f.name, len(f.zStartMm, u),
                       len(f.zEndMm, u));
            printCone(f, u, s.part.toleranceClass);
            break;
        case FeatureKind::Chamfer:
            fmt::print("  [{}] {}chamfer \"{}\": z {} to {}, {} from the axis, diameter {} to {}\n",
                       i, side, f.name, len(f.zStartMm, u), len(f.zEndMm, u),
                       deg(f.cone.halfAngleRad), len(f.cone.diameterAt(f.zStartMm), u),
                       len(f.cone.diameterAt(f.zEndMm), u));
            break;
        case FeatureKind::Face:
            fmt::print("  [{}] {}face \"{}\" at z = {}, out to diameter {}\n", i, side, f.name,
                       len(f.zStartMm, u), len(f.diameterMm, u));
            break;
        }
    }
    const Tool& t = s.tool;
    if (t.kind == ToolKind::BoringBar)
        fmt::print("tool: boring bar {} diameter, overhang {} ({:.1f} bar diameters), enters "
                   "bores of {} or more, axis {}\n",
                   len(t.barDiameterMm, u), len(t.overhangMm, u), t.overhangMm / t.barDiameterMm,
                   len(t.minBoreMm, u),
                   t.tipHeightMm == 0
                       ? std::string("on centre")
                       : len(std::fabs(t.tipHeightMm), u) +
                             (t.tipHeightMm < 0 ? " below centre" : " above centre"));
    const std::string shape =
        t.shape ? fmt::format("ISO 1832 shape {}", t.shape) : std::string("insert");
    fmt::print("{}: {}, included angle ε {}, nose radius {}\n",
               t.kind == ToolKind::BoringBar ? "      insert" : "tool", shape,
               t.shape == 'R' ? std::string("(round)") : deg(t.includedAngleRad),
               len(t.noseRadiusMm, u));
    fmt::print("      entering angle κr {}{}, hand {}\n", deg(t.enteringAngleRad),
               t.holderCode.empty() ? "" : " (ISO 5608 holder " + t.holderCode + ")",
               t.hand == Hand::R   ? "R"
               : t.hand == Hand::L ? "L"
                                   : "N");
    if (t.shape != 'R')
        fmt::print(
            "      trailing-edge limit 180° − κr − ε = {:.2f}° (less the insert's clearance)\n",
            180.0 - radToDeg(t.enteringAngleRad + t.includedAngleRad));
    fmt::print("      edge length {}, thickness {}, tip {}\n", len(t.edgeLengthMm, u),
               len(t.thicknessMm, u),
               t.tipHeightMm == 0 ? std::string("on centre")
                                  : len(std::fabs(t.tipHeightMm), u) +
                                        (t.tipHeightMm < 0 ? " below centre" : " above centre"));
    const Setup& su = s.setup;
    fmt::print("setup: compound reads {} {}; true angle from the spindle axis {}\n",
               deg(su.compoundReadingRad),
               su.compoundScale == CompoundScale::FromAxis ? "(scale from the spindle axis)"
                                                           : "(scale from the cross-slide)",
               deg(su.compoundAxisAngleRad()));
    if (su.compoundErrorRad != 0)
        fmt::print("       compound set off by {}\n", deg(su.compoundErrorRad));
    if (const Feature* cone = s.part.mainCone())
        fmt::print("       compound true angle minus the main cone's half angle: {:+.1f}″\n",
                   radToDeg(su.compoundAxisAngleRad() - cone->cone.halfAngleRad) * 3600.0);
    fmt::print("       winding the compound in (reading increasing) moves the tool {}: {}\n",
               compoundSenseWords(su), slideText(su.compound, u));
    fmt::print("       cross-slide: {} dial, reads 0 at diameter {}; {}\n",
               su.crossDial == DialMode::Diameter ? "diameter" : "radius",
               len(su.zeroDiameterMm, u), slideText(su.cross, u));
    fmt::print("       saddle: reads 0 at z = {}; {}\n", len(su.zeroZMm, u),
               slideText(su.saddle, u));
    if (su.spindleRpm)
        fmt::print("       spindle {:.0f} rev/min\n", *su.spindleRpm);
    int counts[4] = {0, 0, 0, 0};
    for (const Pass& p : s.plan.passes)
        ++counts[static_cast<int>(p.kind)];
    fmt::print("plan: {} pass(es): {} compound, {} saddle, {} cross-slide, {} path\n",
               s.plan.passes.size(), counts[0], counts[1], counts[2], counts[3]);
    fmt::print("planning: max depth {}, finish allowance {}, feeds {} / {} per rev\n",
               len(s.planning.maxDepthMm, u), len(s.planning.finishAllowanceMm, u),
               len(s.planning.roughFeedMmPerRev, u), len(s.planning.finishFeedMmPerRev, u));
    if (s.expect.withinTolerance || !s.expect.findings.empty() || s.expect.noFindings) {
        std::string e = s.expect.withinTolerance ? verdictWords(*s.expect.withinTolerance)
                                                 : "no verdict stated";
        for (const auto& k : s.expect.findings)
            e += ", " + k;
        if (s.expect.noFindings)
            e += ", no findings";
        fmt::print("expect: {}\n", e);
    }
    printNotes(s);
    fmt::print("OK: the scene is valid.\n");
}

} // namespace

void registerCheck(CLI::App& app, int& exitCode) {
    auto* cmd =
        app.add_subcommand("check", "Validate a scene file and print what it says, in its units");
    auto scene = std::make_shared<std::string>();
    cmd->add_option("SCENE", *scene, "Scene file (.toml)")->required();
    cmd->callback([scene, &exitCode] {
        const Scene s = io::readScene(*scene); // throws InputError: exit 2, message on stderr
        printScene(s);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
