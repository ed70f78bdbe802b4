#include "swarf/geometry/layer.h"

#include <Standard_Version.hxx>

namespace swarf::geometry {
std::string modellerVersion() {
    return std::string("OCCT ") + OCC_VERSION_COMPLETE;
}
} // namespace swarf::geometry
