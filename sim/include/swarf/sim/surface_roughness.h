#pragma once
// The roughness of the finished surface, measured on the feed-mark surface (feed_marks.h): Rt and
// Ra of the marks a move leaves, normal to the surface. The closed forms of the nose arc alone are
// in roughness.h; these are measured, so they also hold where the trailing edge, the tip height or
// another move shapes the marks.
#include "swarf/sim/feed_marks.h"

namespace swarf {

/// Peak-to-valley (Rt) and arithmetic mean (Ra) roughness, µm, normal to the surface.
struct Roughness {
    double rtUm = 0, raUm = 0;
};

/// The roughness move `move` leaves between zLoMm and zHiMm: along four meridians over a whole
/// number of its mark pitches (at most 16, centred in the stretch), 2048 samples a pitch, each
/// taken as R(z, φ) less the move's swept envelope there (the marks' valleys); the mean line is
/// that envelope plus the mean height. Rt is the largest height less the smallest, Ra the mean
/// distance from the mean line, both scaled by the cosine of the envelope's slope, averaged over
/// the meridians. Zero if the move leaves no marks or the stretch is shorter than one pitch.
Roughness measureRoughness(const FeedMarkSurface& surface, int move, double zLoMm, double zHiMm);

} // namespace swarf
