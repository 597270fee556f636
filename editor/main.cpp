// stripsmith: the stripboard layout editor.
//
//   stripsmith [--size WxH] [BOARD]          open a window (an empty board without BOARD)
//   stripsmith --screenshot OUT.png [--size WxH] [--view component|copper|both] BOARD
//                                            render the board as the editor shows it, then exit
//   stripsmith --sheet OUT.pdf|OUT.svg [--paper a4|letter] BOARD
//                                            write the printable build sheet, no window
//   stripsmith --layout OUT.board.json [--board HxS] [--seconds S] [--seed N] [--rails] INPUT
//                                            lay out a circuit (or a board's rest), no window
//   stripsmith --help | --version
//
// Sections: arguments | window and ImGui | screenshot | main loop.
#include <GL/gl.h>

#include <SFML/Graphics/Image.hpp>
#include <SFML/Window.hpp>
#include <backends/imgui_impl_opengl2.h>
#include <imgui.h>

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <deque>
#include <optional>
#include <string>
#include <vector>

#include "editor/app/editor_app.hpp"
#include "editor/frame.hpp"
#include "editor/app/look.hpp"
#include "editor/file_actions.hpp"
#include "editor/platform/draw_data_split.hpp"
#include "editor/platform/imgui_impl_sfml.hpp"
#include "editor/platform/x11_errors.hpp"
#include "netcheck/model/printable.hpp"
#include "editor/sheet/sheet_cli.hpp"
#include "editor/layout_cli.hpp"

namespace {

using namespace stripsmith;

// ---- arguments -------------------------------------------------------------------------------

struct Options {
    std::string board;
    std::string screenshot;
    unsigned width = 1400;
    unsigned height = 900;
    Side side = Side::Component;
};

constexpr const char* kUsage =
    "usage: stripsmith [--size WxH] [BOARD]\n"
    "       stripsmith --screenshot OUT.png [--size WxH] [--view component|copper|both] BOARD\n"
    "       stripsmith --sheet OUT.pdf|OUT.svg [--paper a4|letter] BOARD\n"
    "       stripsmith --layout OUT.board.json [--board HxS] [--seconds S] [--seed N] [--rails]\n"
    "                  INPUT\n"
    "       stripsmith --help | --version\n";

constexpr const char* kHelp =
    "\n"
    "Opens BOARD (a .board.json file), or an empty board, in the stripboard layout editor.\n"
    "--screenshot renders the board as the editor shows it to a PNG file and exits; --sheet\n"
    "writes the printable build sheet at 1:1 (PDF or SVG) without opening a window; --layout\n"
    "lays out a circuit (a circuit file, a SPICE deck, or a board whose parts not yet placed are\n"
    "placed around the ones that are) and writes the board, without opening a window.\n"
    "The manual: man stripsmith.\n";

int usage(const std::string& problem) {
    std::fprintf(stderr, "stripsmith: %s\n%s", problem.c_str(), kUsage);
    return 2;
}

std::optional<Options> parseArgs(int argc, char** argv, std::string& problem) {
    Options o;
    std::vector<std::string> args(argv + 1, argv + argc);
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& a = args[i];
        auto value = [&]() -> std::optional<std::string> {
            if (i + 1 >= args.size()) {
                problem = a + " needs a value";
                return std::nullopt;
            }
            return args[++i];
        };
        if (a == "--screenshot") {
            auto v = value();
            if (!v) return std::nullopt;
            o.screenshot = *v;
        } else if (a == "--size") {
            auto v = value();
            if (!v) return std::nullopt;
            unsigned w = 0, h = 0;
            if (std::sscanf(v->c_str(), "%ux%u", &w, &h) != 2 || w < 320 || h < 240 || w > 8192 || h > 8192) {
                problem = "--size wants WIDTHxHEIGHT in pixels (at least 320x240), not \"" + *v + "\"";
                return std::nullopt;
            }
            o.width = w;
            o.height = h;
        } else if (a == "--view") {
            auto v = value();
            if (!v) return std::nullopt;
            if (*v == "component") o.side = Side::Component;
            else if (*v == "copper") o.side = Side::Copper;
            else if (*v == "both" || *v == "see-through") o.side = Side::SeeThrough;
            else {
                problem = "--view wants component, copper or both, not \"" + *v + "\"";
                return std::nullopt;
            }
        } else if (a == "--new") {
            // An empty board: the default without BOARD too.
        } else if (!a.empty() && a[0] == '-') {
            problem = "unknown option " + a;
            return std::nullopt;
        } else if (o.board.empty()) {
            o.board = a;
        } else {
            problem = "only one board file can be opened";
            return std::nullopt;
        }
    }
    if (!o.screenshot.empty() && o.board.empty()) {
        problem = "--screenshot needs a board file";
        return std::nullopt;
    }
    return o;
}

// ---- window and ImGui ----------------------------------------------------------------------------

void renderFrame(sf::Window& window, EditorApp& app, float dt, platform::DrawDataSplitter& splitter) {
    platform::newFrame(window, dt);
    ImGui_ImplOpenGL2_NewFrame();
    ImGui::NewFrame();
    buildFrame(app);
    ImGui::Render();
    const ImVec2 size = ImGui::GetIO().DisplaySize;
    glViewport(0, 0, static_cast<int>(size.x), static_cast<int>(size.y));
    glClearColor(0.925f, 0.918f, 0.894f, 1.0f);  // the theme's panel paper (editor/app/look.cpp)
    glClear(GL_COLOR_BUFFER_BIT);
    splitter.split(ImGui::GetDrawData());
    ImGui_ImplOpenGL2_RenderDrawData(ImGui::GetDrawData());
}

std::string windowTitle(const EditorApp& app) {
    const std::string& path = app.doc.path();
    // A file name may hold control characters; the window manager must not act on them.
    const std::string name =
        path.empty() ? "untitled" : netcheck::escapeControls(path.substr(path.find_last_of('/') + 1));
    return "Stripsmith - " + name + (app.doc.modified() ? " *" : "");
}

// ---- screenshot ----------------------------------------------------------------------------------

bool saveScreenshot(unsigned width, unsigned height, const std::string& path) {
    std::vector<sf::Uint8> pixels(static_cast<std::size_t>(width) * height * 4);
    glPixelStorei(GL_PACK_ALIGNMENT, 1);
    glReadBuffer(GL_BACK);
    glReadPixels(0, 0, static_cast<int>(width), static_cast<int>(height), GL_RGBA, GL_UNSIGNED_BYTE, pixels.data());
    // GL rows run bottom-up.
    std::vector<sf::Uint8> flipped(pixels.size());
    const std::size_t row = static_cast<std::size_t>(width) * 4;
    for (unsigned y = 0; y < height; ++y)
        std::copy_n(pixels.begin() + static_cast<std::ptrdiff_t>(y * row), row,
                    flipped.begin() + static_cast<std::ptrdiff_t>((height - 1 - y) * row));
    for (std::size_t i = 3; i < flipped.size(); i += 4) flipped[i] = 255;
    sf::Image image;
    image.create(width, height, flipped.data());
    return image.saveToFile(path);
}

// ---- main loop -------------------------------------------------------------------------------------

// Key presses (modifiers aside) and mouse-button presses and releases in the input queue. What feeding the
// queue removes from it is what a frame took in; the STRIPSMITH_E2E frame line reports the sums.
struct InputCount {
    unsigned long keys = 0;
    unsigned long buttons = 0;
};

InputCount countInput(const std::deque<sf::Event>& queue) {
    using K = sf::Keyboard;
    InputCount count;
    for (const sf::Event& event : queue) {
        if (event.type == sf::Event::MouseButtonPressed || event.type == sf::Event::MouseButtonReleased)
            ++count.buttons;
        if (event.type != sf::Event::KeyPressed) continue;
        const K::Key key = event.key.code;
        const bool modifier = key == K::LControl || key == K::RControl || key == K::LShift ||
                              key == K::RShift || key == K::LAlt || key == K::RAlt ||
                              key == K::LSystem || key == K::RSystem;
        if (!modifier) ++count.keys;
    }
    return count;
}

int run(const Options& options) {
    ImGui::CreateContext();
    ImGui::GetIO().IniFilename = nullptr;  // the layout is fixed; nothing to remember
    loadFonts();
    platform::init();
    platform::tolerateCursorErrors();

    sf::ContextSettings gl;
    gl.depthBits = 0;
    sf::Window window(sf::VideoMode(options.width, options.height), "Stripsmith", sf::Style::Default, gl);
    window.setPosition({0, 0});
    window.setFramerateLimit(60);
    window.setActive(true);

    ImGui_ImplOpenGL2_Init();
    platform::allowLargeDrawLists();
    platform::DrawDataSplitter splitter;

    EditorApp app;
    app.view.side = options.side;
    app.log = TestLog::fromEnvironment();
    const bool screenshot = !options.screenshot.empty();
    if (!screenshot) {
        app.recent.load(RecentFiles::defaultFile());
        app.recoveryDir = recoveryFolder();
        app.autosaveSeconds = autosaveInterval();
        // Its own slot first, so that an editor starting at the same moment sees this one running.
        if (auto slot = RecoverySlot::create(app.recoveryDir, app.recoveryError)) {
            app.recovery = std::move(*slot);
        } else {
            app.say("Autosave is off: " + app.recoveryError);
        }
        app.dialogs.recovery = findLeftCopy(app.recoveryDir);
    }
    int status = 0;
    if (!options.board.empty() && !loadBoardFile(app, options.board)) {
        if (screenshot) {
            std::fprintf(stderr, "stripsmith: %s\n", app.dialogs.errorText.c_str());
            status = 2;
        }
    }

    if (screenshot && status == 0) {
        // Two frames let ImGui settle window sizes before the one captured.
        for (int i = 0; i < 3; ++i) renderFrame(window, app, 1.0f / 60.0f, splitter);
        if (!saveScreenshot(options.width, options.height, options.screenshot)) {
            std::fprintf(stderr, "stripsmith: cannot write %s\n", options.screenshot.c_str());
            status = 2;
        }
    }

    std::deque<sf::Event> queue;
    InputCount taken;
    std::string title;
    auto last = std::chrono::steady_clock::now();
    while (!screenshot && !app.quitNow && window.isOpen()) {
        for (sf::Event event; window.pollEvent(event);) queue.push_back(event);
        bool closeRequested = false;
        const InputCount waiting = app.log.on() ? countInput(queue) : InputCount{};
        platform::feedEvents(queue, closeRequested);
        if (app.log.on()) {
            const InputCount left = countInput(queue);
            taken.keys += waiting.keys - left.keys;
            taken.buttons += waiting.buttons - left.buttons;
        }
        if (closeRequested) app.quitRequested = true;
        const auto now = std::chrono::steady_clock::now();
        const float dt = std::chrono::duration<float>(now - last).count();
        last = now;
        renderFrame(window, app, dt, splitter);
        window.display();
        tickAutosave(app, dt);
        if (const std::string t = windowTitle(app); t != title) {
            title = t;
            window.setTitle(title);
        }
        app.log.frame(app.doc.revision(), taken.keys, taken.buttons);
    }
    if (!screenshot) endSession(app);

    ImGui_ImplOpenGL2_Shutdown();
    platform::shutdown();
    ImGui::DestroyContext();
    window.close();
    return status;
}

}  // namespace

int main(int argc, char** argv) {
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        const bool help = arg == "--help" || arg == "-h";
        if (!help && arg != "--version") continue;
        if (help) std::printf("%s%s", kUsage, kHelp);
        else std::printf("stripsmith %s\n", STRIPSMITH_VERSION);
        return std::fflush(stdout) == 0 && !std::ferror(stdout) ? 0 : 2;
    }
    if (sheet::wantsSheetCommand(argc, argv)) return sheet::runSheetCommand(argc, argv);
    if (wantsLayoutCommand(argc, argv)) return runLayoutCommand(argc, argv);
    std::string problem;
    const auto options = parseArgs(argc, argv, problem);
    if (!options) return usage(problem);
    // A missing font is a clear error now, not a window with the wrong text later.
    if (const std::string missing = missingAssets(); !missing.empty()) {
        std::fprintf(stderr, "stripsmith: %s\n", missing.c_str());
        return 2;
    }
    return run(*options);
}
