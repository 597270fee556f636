#include "editor/platform/draw_data_split.hpp"

#include <algorithm>
#include <cstring>

namespace stripsmith::platform {

void allowLargeDrawLists() { ImGui::GetIO().BackendFlags |= ImGuiBackendFlags_RendererHasVtxOffset; }

namespace {

bool usesVtxOffset(const ImDrawList* list) {
    for (const ImDrawCmd& cmd : list->CmdBuffer)
        if (cmd.VtxOffset != 0) return true;
    return false;
}

}  // namespace

void DrawDataSplitter::split(ImDrawData* data) {
    owned_.clear();
    lists_.clear();
    if (!data || !data->Valid) return;
    for (int n = 0; n < data->CmdListsCount; ++n) {
        ImDrawList* source = data->CmdLists[n];
        if (!usesVtxOffset(source)) {
            lists_.push_back(source);
            continue;
        }
        // One list per run of commands sharing a vertex offset; its vertices end where the next
        // run's begin.
        const int count = source->CmdBuffer.Size;
        for (int first = 0; first < count;) {
            const unsigned base = source->CmdBuffer[first].VtxOffset;
            int last = first;
            while (last + 1 < count && source->CmdBuffer[last + 1].VtxOffset == base) ++last;
            const unsigned vtxEnd = last + 1 < count ? source->CmdBuffer[last + 1].VtxOffset
                                                     : static_cast<unsigned>(source->VtxBuffer.Size);
            const unsigned idxBegin = source->CmdBuffer[first].IdxOffset;
            const ImDrawCmd& tail = source->CmdBuffer[last];
            const unsigned idxEnd = tail.IdxOffset + tail.ElemCount;

            auto list = std::make_unique<ImDrawList>(ImGui::GetDrawListSharedData());
            list->Flags = source->Flags;
            list->VtxBuffer.resize(static_cast<int>(vtxEnd - base));
            if (vtxEnd > base)
                std::memcpy(list->VtxBuffer.Data, source->VtxBuffer.Data + base, (vtxEnd - base) * sizeof(ImDrawVert));
            list->IdxBuffer.resize(static_cast<int>(idxEnd - idxBegin));
            if (idxEnd > idxBegin)
                std::memcpy(list->IdxBuffer.Data, source->IdxBuffer.Data + idxBegin, (idxEnd - idxBegin) * sizeof(ImDrawIdx));
            for (int i = first; i <= last; ++i) {
                ImDrawCmd cmd = source->CmdBuffer[i];
                cmd.VtxOffset = 0;
                cmd.IdxOffset -= idxBegin;
                list->CmdBuffer.push_back(cmd);
            }
            lists_.push_back(list.get());
            owned_.push_back(std::move(list));
            first = last + 1;
        }
    }
    data->CmdLists = lists_.data();
    data->CmdListsCount = static_cast<int>(lists_.size());
}

}  // namespace stripsmith::platform
