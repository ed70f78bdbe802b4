// libFuzzer target: any bytes into the scene reader. The reader either gives a Scene whose
// numbers are all finite and that the kernel's cheap first steps accept (the insert's outline,
// the machine model's moves, the notes `swarf check` prints, the planner), or refuses with an
// InputError that names this file and a line, and exits 2. Anything else is a bug: another
// exception (the CLI would exit 70), a non-finite value let through, a sanitizer report, an
// assert, a hang or running out of memory. Built by SWARF_FUZZ=ON; run by tests/fuzz/run.sh.
#include "swarf/io/scene_reader.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/scene_notes.h"
#include "swarf/sim/tool_outline.h"

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <initializer_list>
#include <string>

namespace {

void requireFinite(std::initializer_list<double> values, const char* what) {
    for (double v : values)
        if (!std::isfinite(v)) {
            std::fprintf(stderr, "a non-finite value in a scene the reader accepted: %s\n", what);
            std::abort();
        }
}

void requireFinite(const swarf::Slide& s, const char* what) {
    requireFinite({s.mmPerDivision, s.backlashMm, s.travelMm}, what);
}

void requireFinite(const swarf::Scene& s) {
    const swarf::Stock& st = s.stock;
    requireFinite({st.diameterMm, st.lengthMm, st.stickOutMm, st.faceAllowanceMm}, "stock");
    for (const swarf::Feature& f : s.part.features)
        requireFinite({f.zStartMm, f.zEndMm, f.diameterMm, f.cone.gaugeZMm, f.cone.gaugeDiameterMm,
                       f.cone.halfAngleRad, f.toleranceMm, f.angleToleranceRad},
                      "feature");
    const swarf::Tool& t = s.tool;
    requireFinite({t.includedAngleRad, t.noseRadiusMm, t.enteringAngleRad, t.edgeLengthMm,
                   t.tipHeightMm, t.thicknessMm},
                  "tool");
    const swarf::Setup& u = s.setup;
    requireFinite({u.compoundReadingRad, u.compoundErrorRad, u.zeroDiameterMm, u.zeroZMm,
                   u.spindleRpm.value_or(0)},
                  "setup");
    requireFinite(u.compound, "compound");
    requireFinite(u.cross, "cross-slide");
    requireFinite(u.saddle, "saddle");
    for (const swarf::Pass& p : s.plan.passes) {
        requireFinite({p.crossMm, p.compoundMm, p.saddleMm, p.fromMm, p.toMm, p.feedMmPerRev},
                      "pass");
        for (const auto& [z, x] : p.pathZX)
            requireFinite({z, x}, "path point");
    }
    const swarf::PlanningOptions& p = s.planning;
    requireFinite({p.maxDepthMm, p.finishAllowanceMm, p.roughFeedMmPerRev, p.finishFeedMmPerRev,
                   p.rollDiameterMm},
                  "planning");
    requireFinite({s.sim.profileStepMm}, "sim");
    for (double b : s.gaugeBlocksMm)
        requireFinite({b}, "gauge block");
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string text(reinterpret_cast<const char*>(data), size);
    const std::string file = "fuzz.toml";
    try {
        const swarf::Scene scene = swarf::io::readSceneText(text, file);
        requireFinite(scene);
        const swarf::ToolOutline outline(scene.tool);
        (void)outline.polygon();
        (void)swarf::planMoves(scene);
        (void)swarf::sceneNotes(scene);
        (void)swarf::planCone(scene);
    } catch (const swarf::InputError& e) {
        const std::string msg = e.what();
        // The message starts with file:line and names what was expected.
        if (msg.rfind(file + ":", 0) != 0 || e.where().line <= 0 || e.expected().empty() ||
            e.exitCode() != swarf::kExitBadInput) {
            std::fprintf(stderr, "badly formed refusal: %s\n", msg.c_str());
            std::abort();
        }
    }
    return 0;
}
