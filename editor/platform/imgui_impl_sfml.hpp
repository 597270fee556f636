// Dear ImGui 1.86 platform glue for SFML 2.5 windows (rendering is done by ImGui's OpenGL2 backend).
#pragma once

#include <deque>

#include <SFML/Window.hpp>

namespace stripsmith::platform {

/// Sets up key map, clipboard, cursors and backend flags for the current ImGui context. Call
/// before creating the window: SFML 2.5 on X11 only honours cursors made before the window.
void init();

/// Feeds queued window events to ImGui, at most one press/release per key or button per frame so
/// that a press and release arriving between two frames (fast clicks, scripted input) are both
/// seen. Events not yet fed stay in `queue` for the next frame. Returns false on a Closed event
/// (which is consumed).
bool feedEvents(std::deque<sf::Event>& queue, bool& closeRequested);

/// Display size, time step, mouse position, modifiers and cursor shape; call before ImGui::NewFrame.
void newFrame(sf::Window& window, float deltaSeconds);

/// Releases cursors and clipboard storage.
void shutdown();

/// Index into io.KeysDown for an SFML key (for ImGui::IsKeyPressed).
constexpr int keyIndex(sf::Keyboard::Key key) { return static_cast<int>(key); }

}  // namespace stripsmith::platform
