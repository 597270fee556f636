// Dear ImGui 1.86 platform glue for SFML 2.5.
//
// Feature checklist:
//  [x] Keyboard: io.KeysDown indexed by sf::Keyboard::Key, io.KeyMap for ImGui's own keys (Tab
//      left out: no keyboard walk into text fields), Ctrl/Shift/Alt/Super from the key state (left
//      and right keys both count).
//  [x] Text input: sf::Event::TextEntered -> io.AddInputCharacter (control characters dropped).
//  [x] Mouse: position, five buttons, vertical and horizontal wheel; a press and release arriving
//      within one frame are spread over two frames so no click is lost.
//  [x] Mouse cursors: ImGui cursor shapes mapped to sf::Cursor system cursors; hidden when ImGui
//      asks for none.
//  [x] Clipboard: sf::Clipboard, UTF-8 both ways.
//  [x] Display size from the window (on resize too); framebuffer scale 1 (SFML 2.5 reports
//      window size in pixels).
//  [x] Focus: io.AddFocusEvent on focus gained/lost (releases held keys).
//  [ ] Gamepads, IME candidate window: not needed by the editor.

#include "editor/platform/imgui_impl_sfml.hpp"

#include <array>
#include <memory>
#include <string>

#include <SFML/Window/Clipboard.hpp>
#include <SFML/Window/Cursor.hpp>
#include <imgui.h>

namespace stripsmith::platform {
namespace {

struct BackendData {
    std::array<std::unique_ptr<sf::Cursor>, ImGuiMouseCursor_COUNT> cursors;
    std::string clipboard;
    ImGuiMouseCursor lastCursor = ImGuiMouseCursor_COUNT;
    std::array<bool, sf::Mouse::ButtonCount> mouseDown{};
    bool hidden = false;
};

BackendData* data() {
    return ImGui::GetCurrentContext()
               ? static_cast<BackendData*>(ImGui::GetIO().BackendPlatformUserData)
               : nullptr;
}

const char* getClipboard(void*) {
    BackendData* bd = data();
    auto utf8 = sf::Clipboard::getString().toUtf8();
    bd->clipboard.assign(utf8.begin(), utf8.end());
    return bd->clipboard.c_str();
}

void setClipboard(void*, const char* text) {
    sf::Clipboard::setString(sf::String::fromUtf8(text, text + std::char_traits<char>::length(text)));
}

void loadCursor(BackendData& bd, ImGuiMouseCursor imguiCursor, sf::Cursor::Type type) {
    auto cursor = std::make_unique<sf::Cursor>();
    if (cursor->loadFromSystem(type)) bd.cursors[static_cast<std::size_t>(imguiCursor)] = std::move(cursor);
}

void mapKeys(ImGuiIO& io) {
    using K = sf::Keyboard;
    // Tab is left unmapped: it is the editor's own key (it turns the board over), and ImGui's Tab
    // walks the keyboard into the next text field, where the keys after it would change the board
    // (digits in the strips box). A text field takes keys only when the user clicked it.
    io.KeyMap[ImGuiKey_Tab] = -1;
    io.KeyMap[ImGuiKey_LeftArrow] = K::Left;
    io.KeyMap[ImGuiKey_RightArrow] = K::Right;
    io.KeyMap[ImGuiKey_UpArrow] = K::Up;
    io.KeyMap[ImGuiKey_DownArrow] = K::Down;
    io.KeyMap[ImGuiKey_PageUp] = K::PageUp;
    io.KeyMap[ImGuiKey_PageDown] = K::PageDown;
    io.KeyMap[ImGuiKey_Home] = K::Home;
    io.KeyMap[ImGuiKey_End] = K::End;
    io.KeyMap[ImGuiKey_Insert] = K::Insert;
    io.KeyMap[ImGuiKey_Delete] = K::Delete;
    io.KeyMap[ImGuiKey_Backspace] = K::BackSpace;
    io.KeyMap[ImGuiKey_Space] = K::Space;
    io.KeyMap[ImGuiKey_Enter] = K::Enter;
    io.KeyMap[ImGuiKey_Escape] = K::Escape;
    // SFML 2.5 has no separate keypad Enter; map it to Enter so both fire.
    io.KeyMap[ImGuiKey_KeyPadEnter] = K::Enter;
    io.KeyMap[ImGuiKey_A] = K::A;
    io.KeyMap[ImGuiKey_C] = K::C;
    io.KeyMap[ImGuiKey_V] = K::V;
    io.KeyMap[ImGuiKey_X] = K::X;
    io.KeyMap[ImGuiKey_Y] = K::Y;
    io.KeyMap[ImGuiKey_Z] = K::Z;
}

bool validKey(sf::Keyboard::Key key) { return key >= 0 && key < 512; }

void updateModifiers(ImGuiIO& io) {
    using K = sf::Keyboard;
    io.KeyCtrl = io.KeysDown[K::LControl] || io.KeysDown[K::RControl];
    io.KeyShift = io.KeysDown[K::LShift] || io.KeysDown[K::RShift];
    io.KeyAlt = io.KeysDown[K::LAlt] || io.KeysDown[K::RAlt];
    io.KeySuper = io.KeysDown[K::LSystem] || io.KeysDown[K::RSystem];
}

bool isModifier(sf::Keyboard::Key key) {
    using K = sf::Keyboard;
    return key == K::LControl || key == K::RControl || key == K::LShift || key == K::RShift ||
           key == K::LAlt || key == K::RAlt || key == K::LSystem || key == K::RSystem;
}

// Keys and buttons already changed this frame: a second change waits for the next frame.
struct FrameChanges {
    std::array<bool, 512> keys{};
    bool keyWentDown = false;  ///< a key other than a modifier was pressed this frame
    std::array<bool, sf::Mouse::ButtonCount> buttons{};
};

// Applies one event; false when it must wait for the next frame.
bool applyEvent(const sf::Event& event, FrameChanges& changed, BackendData& bd, bool& close) {
    ImGuiIO& io = ImGui::GetIO();
    switch (event.type) {
    case sf::Event::Closed:
        close = true;
        return true;
    case sf::Event::KeyPressed:
    case sf::Event::KeyReleased: {
        const sf::Keyboard::Key key = event.key.code;
        if (!validKey(key)) return true;
        auto k = static_cast<std::size_t>(key);
        const bool down = event.type == sf::Event::KeyPressed;
        if (io.KeysDown[k] == down) return true;  // auto-repeat or duplicate
        if (changed.keys[k]) return false;
        // Ctrl let go in the frame S went down would take Ctrl+S apart (fast fingers, and xdotool,
        // let go of the modifier first): the release waits for the next frame.
        if (!down && isModifier(key) && changed.keyWentDown) return false;
        changed.keys[k] = true;
        if (down && !isModifier(key)) changed.keyWentDown = true;
        io.KeysDown[k] = down;
        updateModifiers(io);
        return true;
    }
    case sf::Event::TextEntered:
        if (event.text.unicode >= 32 && event.text.unicode != 127) io.AddInputCharacter(event.text.unicode);
        return true;
    case sf::Event::MouseMoved:
        // A move after a pending release must not overtake it.
        for (bool b : changed.buttons)
            if (b) return false;
        io.MousePos = ImVec2(static_cast<float>(event.mouseMove.x), static_cast<float>(event.mouseMove.y));
        return true;
    case sf::Event::MouseButtonPressed:
    case sf::Event::MouseButtonReleased: {
        auto b = static_cast<std::size_t>(event.mouseButton.button);
        if (b >= bd.mouseDown.size()) return true;
        if (changed.buttons[b]) return false;
        changed.buttons[b] = true;
        bd.mouseDown[b] = event.type == sf::Event::MouseButtonPressed;
        io.MousePos = ImVec2(static_cast<float>(event.mouseButton.x), static_cast<float>(event.mouseButton.y));
        return true;
    }
    case sf::Event::MouseWheelScrolled:
        if (event.mouseWheelScroll.wheel == sf::Mouse::VerticalWheel) io.MouseWheel += event.mouseWheelScroll.delta;
        else io.MouseWheelH += event.mouseWheelScroll.delta;
        return true;
    case sf::Event::LostFocus:
        io.AddFocusEvent(false);
        for (bool& k : io.KeysDown) k = false;
        updateModifiers(io);
        return true;
    case sf::Event::GainedFocus:
        io.AddFocusEvent(true);
        return true;
    case sf::Event::MouseLeft:
        io.MousePos = ImVec2(-FLT_MAX, -FLT_MAX);
        return true;
    default:
        return true;
    }
}

}  // namespace

void init() {
    ImGuiIO& io = ImGui::GetIO();
    auto* bd = new BackendData();
    io.BackendPlatformUserData = bd;
    io.BackendPlatformName = "stripsmith_sfml";
    io.BackendFlags |= ImGuiBackendFlags_HasMouseCursors;
    mapKeys(io);
    io.GetClipboardTextFn = getClipboard;
    io.SetClipboardTextFn = setClipboard;
    loadCursor(*bd, ImGuiMouseCursor_Arrow, sf::Cursor::Arrow);
    loadCursor(*bd, ImGuiMouseCursor_TextInput, sf::Cursor::Text);
    loadCursor(*bd, ImGuiMouseCursor_ResizeAll, sf::Cursor::SizeAll);
    loadCursor(*bd, ImGuiMouseCursor_ResizeNS, sf::Cursor::SizeVertical);
    loadCursor(*bd, ImGuiMouseCursor_ResizeEW, sf::Cursor::SizeHorizontal);
    loadCursor(*bd, ImGuiMouseCursor_ResizeNESW, sf::Cursor::SizeBottomLeftTopRight);
    loadCursor(*bd, ImGuiMouseCursor_ResizeNWSE, sf::Cursor::SizeTopLeftBottomRight);
    loadCursor(*bd, ImGuiMouseCursor_Hand, sf::Cursor::Hand);
    loadCursor(*bd, ImGuiMouseCursor_NotAllowed, sf::Cursor::NotAllowed);
}

bool feedEvents(std::deque<sf::Event>& queue, bool& closeRequested) {
    BackendData* bd = data();
    FrameChanges changed;
    while (!queue.empty()) {
        if (!applyEvent(queue.front(), changed, *bd, closeRequested)) break;
        queue.pop_front();
    }
    return !closeRequested;
}

void newFrame(sf::Window& window, float deltaSeconds) {
    ImGuiIO& io = ImGui::GetIO();
    BackendData* bd = data();
    const sf::Vector2u size = window.getSize();
    io.DisplaySize = ImVec2(static_cast<float>(size.x), static_cast<float>(size.y));
    io.DisplayFramebufferScale = ImVec2(1.0f, 1.0f);
    io.DeltaTime = deltaSeconds > 0.0f ? deltaSeconds : 1.0f / 60.0f;
    for (std::size_t i = 0; i < 5 && i < bd->mouseDown.size(); ++i) io.MouseDown[i] = bd->mouseDown[i];

    if (io.ConfigFlags & ImGuiConfigFlags_NoMouseCursorChange) return;
    const ImGuiMouseCursor cursor = io.MouseDrawCursor ? ImGuiMouseCursor_None : ImGui::GetMouseCursor();
    if (cursor == bd->lastCursor) return;
    bd->lastCursor = cursor;
    if (cursor == ImGuiMouseCursor_None) {
        window.setMouseCursorVisible(false);
        bd->hidden = true;
        return;
    }
    if (bd->hidden) window.setMouseCursorVisible(true);
    bd->hidden = false;
    const auto& wanted = bd->cursors[static_cast<std::size_t>(cursor)];
    const auto& fallback = bd->cursors[ImGuiMouseCursor_Arrow];
    if (wanted) window.setMouseCursor(*wanted);
    else if (fallback) window.setMouseCursor(*fallback);
}

void shutdown() {
    ImGuiIO& io = ImGui::GetIO();
    delete data();
    io.BackendPlatformUserData = nullptr;
    io.BackendPlatformName = nullptr;
}

}  // namespace stripsmith::platform
