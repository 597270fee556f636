// CPU time to build one editor frame (board model -> ImGui draw lists, no GL) for boards of 100,
// 1,000 and 10,000 parts, fitted to the view and at an editing zoom. Target: under 4 ms for
// 1,000 parts (60 frames per second with room to spare on a laptop without a GPU).
// And the cost of one edit as the document makes it: the command, then the re-check.
#include <benchmark/benchmark.h>

#include <imgui.h>

#include "editor/app/editor_app.hpp"
#include "editor/frame.hpp"
#include "editor/app/look.hpp"
#include "editor/platform/draw_data_split.hpp"
#include "editor/tools/part_factory.hpp"
#include "netcheck/edit/cut_commands.hpp"

namespace {

using namespace stripsmith;

// A board of `count` parts of mixed kinds in rows, one part per strip segment, with a cut after
// each part and a link every fourth part, so every layer has work.
netcheck::Board makeBoard(int count) {
    netcheck::Board board;
    const int perRow = count <= 100 ? 5 : count <= 1000 ? 10 : 20;
    board.cols = perRow * 7;
    board.rows = (count + perRow - 1) / perRow * 4 + 2;
    static const char* kKinds[] = {"resistor", "capacitor", "electrolytic", "diode", "led", "resistor", "bjt", "ic"};
    for (int i = 0; i < count; ++i) {
        const int row = (i / perRow) * 4 + 1, col = (i % perRow) * 7 + 1;
        const std::string kind = kKinds[i % 8];
        const std::string ref = "P" + std::to_string(i + 1);
        netcheck::Part part;
        if (kind == "bjt") part = makeMultiPinPart(kind, ref, "BC547", {row, col}, 1, 3);
        else if (kind == "ic") part = makeMultiPinPart(kind, ref, "TL072", {row, col}, 0, 6);
        else {
            const int span = kind == "resistor" || kind == "diode" ? 4 : 1;
            part = makeTwoLeadPart(kind, ref, kind == "resistor" ? "4k7" : "10u", {row, col}, {row, col + span});
        }
        board.parts.push_back(std::move(part));
        board.cuts.push_back({{row + 2, col + 5}, i % 2 ? netcheck::Cut::Kind::Hole : netcheck::Cut::Kind::Between});
        if (i % 4 == 0) board.links.push_back({{row - 1, col + 6}, {row + 2, col + 6}, false, nlohmann::json::object()});
    }
    return board;
}

struct Fixture {
    Fixture() {
        ImGui::CreateContext();
        ImGuiIO& io = ImGui::GetIO();
        io.IniFilename = nullptr;
        io.DisplaySize = {1400, 900};
        platform::allowLargeDrawLists();
        loadFonts();
        unsigned char* pixels = nullptr;
        int w = 0, h = 0;
        io.Fonts->GetTexDataAsRGBA32(&pixels, &w, &h);
    }
    ~Fixture() { ImGui::DestroyContext(); }
};

void frame(EditorApp& app) {
    ImGuiIO& io = ImGui::GetIO();
    io.DeltaTime = 1.0f / 60.0f;
    io.MousePos = {700, 450};  // over the canvas: the hover highlight is part of the work
    ImGui::NewFrame();
    buildFrame(app);
    ImGui::Render();
}

void runFrames(benchmark::State& state, bool fitted) {
    Fixture fixture;
    EditorApp app;
    app.doc.reset(makeBoard(static_cast<int>(state.range(0))), {});
    frame(app);  // settles window sizes and fits the board
    if (!fitted) {
        app.view.holePx = 24.0f;  // an editing zoom: most of a big board is off screen
        frame(app);
    }
    for (auto _ : state) {
        frame(app);
        benchmark::DoNotOptimize(ImGui::GetDrawData()->TotalVtxCount);
    }
    state.counters["vertices"] = static_cast<double>(ImGui::GetDrawData()->TotalVtxCount);
}

// Toggles a hole cut in the free top-left corner hole on every edit (added, then removed).
void BM_Edit(benchmark::State& state) {
    Document doc;
    doc.reset(makeBoard(static_cast<int>(state.range(0))), {});
    const netcheck::Cut cut{{0, 0}, netcheck::Cut::Kind::Hole};
    for (auto _ : state) {
        doc.perform(netcheck::edit::toggleCut(doc.board(), cut));
        benchmark::DoNotOptimize(doc.report().errors.size());
    }
    state.counters["holes"] = doc.board().holeCount();
}

void BM_FrameFitted(benchmark::State& state) { runFrames(state, true); }
void BM_FrameEditingZoom(benchmark::State& state) { runFrames(state, false); }

}  // namespace

BENCHMARK(BM_FrameFitted)->Arg(100)->Arg(1000)->Arg(10000)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_FrameEditingZoom)->Arg(100)->Arg(1000)->Arg(10000)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_Edit)->Arg(100)->Arg(1000)->Arg(10000)->Unit(benchmark::kMillisecond);
BENCHMARK_MAIN();
