// Lets big boards draw with the OpenGL2 renderer, which cannot follow ImDrawCmd::VtxOffset:
// ImGui is told the renderer handles vertex offsets (so a draw list may hold more than 65,536
// vertices with 16-bit indices), and before rendering each such list is split into lists that
// each start at vertex 0.
#pragma once

#include <memory>
#include <vector>

#include <imgui.h>

namespace stripsmith::platform {

/// Sets ImGuiBackendFlags_RendererHasVtxOffset; call once after creating the ImGui context.
void allowLargeDrawLists();

/// Rewrites `data` in place so no command uses a vertex offset. The lists it creates live until
/// the next call.
class DrawDataSplitter {
public:
    void split(ImDrawData* data);

private:
    std::vector<std::unique_ptr<ImDrawList>> owned_;
    std::vector<ImDrawList*> lists_;
};

}  // namespace stripsmith::platform
