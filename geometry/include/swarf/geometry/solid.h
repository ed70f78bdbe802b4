#pragma once
// A B-rep solid from the solid modeller, behind an opaque handle: no modeller type leaks out.
//
// Coordinates of every solid, STEP and STL file swarf writes (millimetres):
//   Z = the spindle axis = our z (from the part's datum face toward the chuck),
//   X = our x (horizontal distance from the axis, the cross-slide direction),
//   Y = completes a right-handed frame (X × Y = Z).
// A profile point (z, x) of the tool plane is the point (X = x, Y = 0, Z = z): the profile lies
// in the XZ half-plane X ≥ 0 and is revolved 360° about Z.
#include <memory>
#include <optional>

namespace swarf::geometry {

/// An axis-aligned box, mm, in the solid's frame (X, Y, Z above).
struct BoxMm {
    double xMin = 0, yMin = 0, zMin = 0;
    double xMax = 0, yMax = 0, zMax = 0;
};

/// A solid (or a compound of solids) of the modeller. Immutable value with shared storage;
/// cheap to copy. A default-constructed Solid is empty (no material).
class Solid {
  public:
    /// The modeller's shape; defined in geometry/src only.
    struct Impl;

    /// An empty solid.
    Solid();
    /// Wraps a modeller shape (used inside geometry/src).
    explicit Solid(std::shared_ptr<const Impl> impl);

    /// True if there is no shape or the shape has no solid in it.
    bool empty() const;
    /// Number of separate solids in the shape (0 if empty).
    int solidCount() const;
    /// Enclosed volume, mm³ (0 if empty). Integrated to a relative accuracy of about 1e-9.
    double volumeMm3() const;
    /// True if the modeller's validity check passes on the whole shape.
    bool isValid() const;
    /// Bounding box, mm, tight (from the exact geometry, not a mesh). Precondition: !empty().
    BoxMm bounds() const;
    /// The outermost radius (mm) of a solid of revolution at the plane Z = zMm: the farthest
    /// crossing of the ray from the axis along +X at that height with the solid's faces (or,
    /// where the ray finds none, as on a flat end face, the outermost point of the section by
    /// the plane). Empty if the plane misses the solid. Throws GeometryError if the modeller
    /// fails.
    std::optional<double> radiusAtZ(double zMm) const;

    /// This minus `other` (boolean difference). Throws GeometryError if the modeller fails.
    Solid minus(const Solid& other) const;
    /// The part of this inside `other` (boolean common). Throws GeometryError if it fails.
    Solid common(const Solid& other) const;

    /// The wrapped shape; precondition: constructed from an Impl.
    const Impl& impl() const { return *impl_; }

  private:
    std::shared_ptr<const Impl> impl_;
};

} // namespace swarf::geometry
