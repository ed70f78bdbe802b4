// libFuzzer target: any bytes into the measurement file reader (MEASURED.toml, scenes/MEASURED.md)
// against a fixed plan, scenes/plan-1-20-chuck-out.toml planned as `swarf correct` plans it. The
// reader either gives Measurements whose numbers are all finite, which the cone fit and the
// correction then take without an exception other than InputError, or it refuses with an
// InputError that names this file and a line, and exits 2. Anything else is a bug: another
// exception (the CLI would exit 70), a non-finite value let through, a sanitizer report, an
// assert, a hang or running out of memory. Built by SWARF_FUZZ=ON; run by tests/fuzz/run.sh.
#include "swarf/io/measured_reader.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/correction.h"
#include "swarf/sim/error.h"
#include "swarf/sim/planner.h"

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <initializer_list>
#include <string>

#ifndef SWARF_SOURCE_DIR
#error "SWARF_SOURCE_DIR must name the source tree (the plan the measurements are read against)"
#endif

namespace {

void requireFinite(std::initializer_list<double> values, const char* what) {
    for (double v : values)
        if (!std::isfinite(v)) {
            std::fprintf(stderr, "a non-finite value in measurements the reader accepted: %s\n",
                         what);
            std::abort();
        }
}

/// The plan the measurements belong to, read and planned once.
const swarf::Scene& fixedPlan() {
    static const swarf::Scene plan = [] {
        swarf::Scene s = swarf::io::readScene(std::string(SWARF_SOURCE_DIR) +
                                              "/scenes/plan-1-20-chuck-out.toml");
        if (s.plan.passes.empty())
            s = swarf::planCone(s).scene;
        return s;
    }();
    return plan;
}

void requireBadInputShape(const swarf::InputError& e, const std::string& file) {
    const std::string msg = e.what();
    if (msg.rfind(file + ":", 0) != 0 || e.where().line <= 0 || e.expected().empty() ||
        e.exitCode() != swarf::kExitBadInput) {
        std::fprintf(stderr, "badly formed refusal: %s\n", msg.c_str());
        std::abort();
    }
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const swarf::Scene& plan = fixedPlan();
    const std::string text(reinterpret_cast<const char*>(data), size);
    const std::string file = "measured.toml";
    swarf::Measurements m;
    try {
        m = swarf::io::readMeasurementsText(text, file, plan);
    } catch (const swarf::InputError& e) {
        requireBadInputShape(e, file);
        return 0;
    }
    for (const swarf::DiameterReading& d : m.diameters)
        requireFinite({d.zMm, d.valueMm, d.uncertaintyMm}, "diameter");
    for (const swarf::RollsReading& r : m.rolls) {
        requireFinite({r.rollDiameterMm, r.uncertaintyMm}, "rolls");
        for (double z : r.zMm)
            requireFinite({z}, "rolls plane");
        for (double v : r.readingMm)
            requireFinite({v}, "rolls reading");
    }
    for (const swarf::GaugeReading& g : m.gauges)
        requireFinite(
            {g.gaugeDiameterMm, g.gaugePlaneMm, g.referenceZMm, g.standOffMm, g.uncertaintyMm},
            "gauge");
    for (const swarf::IndicatorReading& i : m.indicators)
        requireFinite({i.travelMm, i.lineAngleRad, i.changeMm, i.uncertaintyMm}, "indicator");
    // The fit and the correction of an accepted file: a set of readings no cone can give is a
    // refusal (fit.ok false), never an exception.
    const swarf::Correction c = swarf::correctPlan(plan, m);
    if (c.fit.ok)
        requireFinite({c.fit.gaugeDiameterMm, c.fit.gaugeZMm, c.fit.halfAngleRad}, "fit");
    return 0;
}
