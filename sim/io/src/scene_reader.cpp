// Placeholder until the scene reader lands (issue 2).
#include "swarf/io/scene_reader.h"

namespace swarf::io {
Scene readSceneText(const std::string&, const std::string& fileName) {
    throw InputError({fileName, 0, 0}, "", "", "scene reading is not done yet");
}
Scene readScene(const std::string& path) { return readSceneText("", path); }
} // namespace swarf::io
