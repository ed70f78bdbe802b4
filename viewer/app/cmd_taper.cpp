// swarf taper: the bench calculator. One cone in, every set-up figure out, with units. No scene
// file: the cone and the shop's numbers come from options. The options are read and checked in
// taper_request.cpp, the answer is written in taper_text.cpp, and the arithmetic is in sim/.
#include "commands.h"
#include "swarf/sim/error.h"
#include "taper_request.h"

#include <cstdio>
#include <memory>
#include <string>

namespace swarf::app {

void registerTaper(CLI::App& app, int& exitCode) {
    auto o = std::make_shared<TaperOptions>();
    auto* cmd = app.add_subcommand(
        "taper", "Bench calculator: one cone in every form, with compound, sine bar, nose-radius, "
                 "set-over, roll and roughness figures");
    cmd->add_option("--units", o->units,
                    "mm (default) or inch: the unit of every length in and out");
    cmd->add_option(
        "--standard", o->standard,
        "a standard taper: 'Morse 3', 'Metric 80', '7:24 40', NPT, 'Jarno 6', 'B&S 7', 1:10");
    cmd->add_option("--dia", o->dia, "diameter at the gauge plane");
    cmd->add_option("--half-angle", o->halfAngle, "half angle from the axis: 1.4321 or 1°25′56″");
    cmd->add_option("--included", o->included, "included angle: 2.8642 or 2°51′51″");
    cmd->add_option("--ratio", o->ratio, "taper ratio on diameter: 1:20");
    cmd->add_option("--per-foot", o->perFoot, "taper per foot on diameter, in/ft");
    cmd->add_option("--rate", o->rate, "rate of taper C = (D − d)/L");
    cmd->add_option("--dia2", o->dia2, "a second diameter, --length away from --dia");
    cmd->add_option("--length", o->length, "cone length from the gauge plane to its other end");
    cmd->add_option("--gauge-end", o->gaugeEnd, "large (default) or small: which end --dia is at");
    cmd->add_option("--widens", o->widens,
                    "chuck (default) or tailstock: the way the diameter grows on the lathe");
    cmd->add_option("--at", o->at, "print the diameter this far from the gauge plane");
    cmd->add_option("--to-dia", o->toDia,
                    "print how far from the gauge plane the cone has this diameter");
    cmd->add_option("--nose-radius", o->noseRadius,
                    "tool nose radius, for the offsets and roughness");
    cmd->add_option(
        "--tip-side", o->tipSide,
        "chuck (default) or tailstock: the side of the nose the imaginary tip is set on");
    cmd->add_option("--feed", o->feed, "feed per revolution, for the roughness");
    cmd->add_option("--work-length", o->workLength,
                    "work length between centres, for the set-over");
    cmd->add_option("--compound-travel", o->compoundTravel,
                    "usable compound travel (default 100 mm)");
    cmd->add_option("--guide-bar-length", o->guideBarLength,
                    "taper attachment's usable length (default 250 mm)");
    cmd->add_option("--guide-bar-max-angle", o->guideBarMaxAngle,
                    "taper attachment's largest angle (default 10°)");
    cmd->add_option("--max-set-over", o->maxSetOver,
                    "largest tailstock set-over you accept (default 10 mm)");
    cmd->add_option("--rolls", o->rolls, "roll (pin) diameter, for readings over rolls");
    cmd->add_option("--roll-stacks", o->rollStacks, "heights of the blocks under the rolls: H1,H2");
    cmd->add_option("--tip-height", o->tipHeight, "tool tip above (+) or below (−) centre");
    cmd->add_option("--blocks", o->blocks,
                    "your gauge blocks, comma separated, in --units (replaces the common sets)");
    cmd->callback([o, &exitCode] {
        // Everything is checked before anything is printed: a bad option prints nothing.
        const std::string text = taperFiguresText(readTaperOptions(*o));
        std::fputs(text.c_str(), stdout);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
