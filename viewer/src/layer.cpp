#include "swarf/viewer/layer.h"

#include <vtkVersion.h>

namespace swarf::viewer {
std::string toolkitVersion() {
    return std::string("VTK ") + vtkVersion::GetVTKVersion();
}
} // namespace swarf::viewer
