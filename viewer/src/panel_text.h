#pragma once
// Internal to the viewer, and free of VTK: the text of the window's panels at a moment.
#include "swarf/sim/cut.h"
#include "swarf/sim/moment.h"
#include "swarf/sim/scene.h"
#include "swarf/viewer/colour_map.h"
#include "swarf/viewer/trace.h"

#include <string>

namespace swarf::viewer::detail {

/// The panel at the top left: the scene, the pass and how far through it, what the person does,
/// the feed, the three dial readings, the largest left-on and overcut now, and at the end the
/// verdict. Lengths in the scene's units.
std::string momentPanelText(const Scene& scene, const CutResult& result, const MomentView& moment,
                            const DeviationScale& scale);

/// The label of the close-up: its stretch and the feed marks' pitch, height and relief, or why
/// there are no marks to show.
std::string closeUpPanelText(const Scene& scene, const CutResult& result, const MomentView& moment,
                             const CloseUp& close);

} // namespace swarf::viewer::detail
