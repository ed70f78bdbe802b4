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
                    "Mm (default) or inch: the unit of every length in and out");
    cmd->add_option(
        "--standard", o->standard,
        "A standard taper: 'Morse 3', 'Metric 80', '7:24 40', NPT, 'Jarno 6', 'B&S 7', 1:10");
    cmd->add_option("--dia", o->dia, "Diameter at the gauge plane");
    cmd->add_option("--half-angle", o->halfAngle, "Half angle from the axis: 1.4321 or 1°25′56″");
    cmd->add_option("--included", o->included, "Included angle: 2.8642 or 2°51′51″");
    cmd->add_option("--ratio", o->ratio, "Taper ratio on diameter: 1:20");
    cmd->add_option("--per-foot", o->perFoot, "Taper per foot on diameter, in/ft");
    cmd->add_option("--rate", o->rate, "Rate of taper C = (D − d)/L");
    cmd->add_option("--dia2", o->dia2, "A second diameter, --length away from --dia");
    cmd->add_option("--length", o->length, "Cone length from the gauge plane to its other end");
    cmd->add_option("--gauge-end", o->gaugeEnd, "Large (default) or small: which end --dia is at");
    cmd->add_option("--widens", o->widens,
                    "Chuck (default) or tailstock: the way the diameter grows on the lathe");
    cmd->add_option("--at", o->at, "Print the diameter this far from the gauge plane");
    cmd->add_option("--to-dia", o->toDia,
                    "Print how far from the gauge plane the cone has this diameter");
    cmd->add_option("--nose-radius", o->noseRadius,
                    "Tool nose radius, for the offsets and roughness");
    cmd->add_option(
        "--tip-side", o->tipSide,
        "Chuck (default) or tailstock: the side of the nose the imaginary tip is set on");
    cmd->add_option("--feed", o->feed, "Feed per revolution, for the roughness");
    cmd->add_option("--work-length", o->workLength,
                    "Work length between centres, for the set-over");
    cmd->add_option("--compound-travel", o->compoundTravel,
                    "Usable compound travel (default 100 mm)");
    cmd->add_option("--guide-bar-length", o->guideBarLength,
                    "Taper attachment's usable length (default 250 mm)");
    cmd->add_option("--guide-bar-max-angle", o->guideBarMaxAngle,
                    "Taper attachment's largest angle (default 10°)");
    cmd->add_option("--max-set-over", o->maxSetOver,
                    "Largest tailstock set-over you accept (default 10 mm)");
    cmd->add_option("--rolls", o->rolls, "Roll (pin) diameter, for readings over rolls");
    cmd->add_option("--roll-stacks", o->rollStacks, "Heights of the blocks under the rolls: H1,H2");
    cmd->add_option("--tip-height", o->tipHeight, "Tool tip above (+) or below (−) centre");
    cmd->add_option("--blocks", o->blocks,
                    "Your gauge blocks, comma separated, in --units (replaces the common sets)");
    cmd->callback([o, &exitCode] {
        // Everything is checked before anything is printed: a bad option prints nothing.
        const std::string text = taperFiguresText(readTaperOptions(*o));
        std::fputs(text.c_str(), stdout);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
