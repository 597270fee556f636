// Splitting draw lists of more than 65,536 vertices for the OpenGL2 renderer, and building whole
// frames without a window.
#include <doctest/doctest.h>

#include <imgui.h>

#include "editor/app/editor_app.hpp"
#include "editor/canvas/board_transform.hpp"
#include "editor/frame.hpp"
#include "editor/platform/draw_data_split.hpp"
#include "editor/tools/part_factory.hpp"

using namespace stripsmith;

namespace {

struct Context {
    Context() {
        ImGui::CreateContext();
        ImGuiIO& io = ImGui::GetIO();
        io.IniFilename = nullptr;
        io.DisplaySize = {1200, 800};
        unsigned char* pixels = nullptr;
        int w = 0, h = 0;
        io.Fonts->GetTexDataAsRGBA32(&pixels, &w, &h);
        platform::allowLargeDrawLists();
    }
    ~Context() { ImGui::DestroyContext(); }
};

}  // namespace

TEST_CASE("draw data split") {
    Context context;
    ImGui::NewFrame();
    ImGui::SetNextWindowPos({0, 0});
    ImGui::SetNextWindowSize({1200, 800});
    ImGui::Begin("many");
    // 30,000 quads = 120,000 vertices: more than 16-bit indices can address from one base.
    ImDrawList* list = ImGui::GetWindowDrawList();
    for (int i = 0; i < 30000; ++i) {
        const float x = static_cast<float>(i % 300) * 4, y = static_cast<float>(i / 300) * 4;
        list->AddRectFilled({x, y}, {x + 3, y + 3}, IM_COL32(255, 0, 0, 255));
    }
    ImGui::End();
    ImGui::Render();
    ImDrawData* data = ImGui::GetDrawData();
    int offsetCommands = 0;
    for (int n = 0; n < data->CmdListsCount; ++n)
        for (const ImDrawCmd& cmd : data->CmdLists[n]->CmdBuffer) offsetCommands += cmd.VtxOffset != 0;
    REQUIRE(offsetCommands > 0);  // ImGui used vertex offsets, which the OpenGL2 renderer ignores
    const int totalIdx = data->TotalIdxCount;

    platform::DrawDataSplitter splitter;
    splitter.split(data);
    int idxCount = 0;
    for (int n = 0; n < data->CmdListsCount; ++n) {
        const ImDrawList* part = data->CmdLists[n];
        CHECK(part->VtxBuffer.Size <= 65536);
        for (const ImDrawCmd& cmd : part->CmdBuffer) {
            CHECK(cmd.VtxOffset == 0);
            CHECK(cmd.IdxOffset + cmd.ElemCount <= static_cast<unsigned>(part->IdxBuffer.Size));
        }
        int pastEnd = 0;
        for (ImDrawIdx idx : part->IdxBuffer) pastEnd += idx >= part->VtxBuffer.Size;
        CHECK_MESSAGE(pastEnd == 0, "indices past their list's vertices");
        idxCount += part->IdxBuffer.Size;
    }
    CHECK(idxCount == totalIdx);  // nothing lost or drawn twice
}

TEST_CASE("frame without a window") {
    Context context;
    EditorApp app;
    netcheck::Board board;
    board.parts.push_back(makeTwoLeadPart("resistor", "R1", "4k7", {1, 1}, {1, 5}));
    board.parts.push_back(makeMultiPinPart("ic", "U1", "TL072", {3, 8}, 0, 8));
    app.doc.reset(board, {});
    for (int i = 0; i < 3; ++i) {
        ImGui::GetIO().DeltaTime = 1.0f / 60.0f;
        ImGui::NewFrame();
        buildFrame(app);
        ImGui::Render();
    }
    SUBCASE("the board is fitted into the canvas between the side panels") {
        const ImVec2 a1 = BoardTransform{app.view.origin, app.view.holePx, board.cols, false}.holeCentre({0, 0});
        CHECK(a1.x > app.view.canvasMin.x);
        CHECK(a1.x < app.view.canvasMax.x);
        CHECK(app.view.holePx > 10.0f);
    }
    SUBCASE("something was drawn") { CHECK(ImGui::GetDrawData()->TotalVtxCount > 1000); }
}
