#include "editor/files/file_chooser.hpp"

#include <algorithm>
#include <cstdlib>
#include <filesystem>
#include <system_error>

#include <imgui.h>
#include <imgui_stdlib.h>

namespace stripsmith {

namespace fs = std::filesystem;

namespace {

std::vector<std::string> suffixesFor(FileChooser::Purpose purpose) {
    switch (purpose) {
    case FileChooser::Purpose::OpenBoard:
    case FileChooser::Purpose::SaveBoard: return {".board.json", ".json"};
    case FileChooser::Purpose::OpenCircuit: return {".json", ".cir", ".net", ".sp", ".spice"};
    case FileChooser::Purpose::ExportSheet: return {".pdf", ".svg"};
    case FileChooser::Purpose::ExportCircuit: return {".json", ".cir", ".net", ".sp", ".spice"};
    }
    return {};
}

const char* titleFor(FileChooser::Purpose purpose) {
    switch (purpose) {
    case FileChooser::Purpose::OpenBoard: return "Open board";
    case FileChooser::Purpose::SaveBoard: return "Save board as";
    case FileChooser::Purpose::OpenCircuit: return "Load circuit";
    case FileChooser::Purpose::ExportSheet: return "Export build sheet";
    case FileChooser::Purpose::ExportCircuit: return "Export circuit";
    }
    return "Choose a file";
}

bool endsWith(const std::string& s, const std::string& suffix) {
    return s.size() >= suffix.size() && s.compare(s.size() - suffix.size(), suffix.size(), suffix) == 0;
}

}  // namespace

std::string FileChooser::resolve(const std::string& folder, const std::string& typed) {
    std::string path = typed;
    if (!path.empty() && path[0] == '~') {
        const char* home = std::getenv("HOME");
        path = std::string(home ? home : "") + path.substr(1);
    }
    fs::path p(path);
    if (p.is_relative()) p = fs::path(folder) / p;
    return p.lexically_normal().string();
}

std::vector<std::string> FileChooser::listFolder(const std::string& folder,
                                                 const std::vector<std::string>& suffixes) {
    std::vector<std::string> dirs, files;
    std::error_code ec;
    for (fs::directory_iterator it(folder, ec), end; !ec && it != end; it.increment(ec)) {
        const std::string name = it->path().filename().string();
        if (name.empty() || name[0] == '.') continue;
        std::error_code typeError;
        if (it->is_directory(typeError)) {
            dirs.push_back(name + "/");
        } else if (suffixes.empty() ||
                   std::any_of(suffixes.begin(), suffixes.end(), [&](const auto& s) { return endsWith(name, s); })) {
            files.push_back(name);
        }
    }
    std::sort(dirs.begin(), dirs.end());
    std::sort(files.begin(), files.end());
    dirs.insert(dirs.end(), files.begin(), files.end());
    return dirs;
}

void FileChooser::open(Purpose purpose, std::string folder, std::string name) {
    std::error_code ec;
    if (folder.empty() || !fs::is_directory(folder, ec)) folder = fs::current_path(ec).string();
    purpose_ = purpose;
    folder_ = std::move(folder);
    typed_ = std::move(name);
    error_.clear();
    open_ = true;
    justOpened_ = true;
    refresh();
}

void FileChooser::refresh() { entries_ = listFolder(folder_, suffixesFor(purpose_)); }

bool FileChooser::accept() {
    if (typed_.empty()) {
        error_ = "Type a file name or pick one.";
        return false;
    }
    const std::string path = resolve(folder_, typed_);
    std::error_code ec;
    if (fs::is_directory(path, ec)) {
        folder_ = path;
        typed_.clear();
        refresh();
        return false;
    }
    const bool saving = purpose_ == Purpose::SaveBoard || purpose_ == Purpose::ExportSheet ||
                        purpose_ == Purpose::ExportCircuit;
    if (!saving && !fs::exists(path, ec)) {
        error_ = "No such file: " + path;
        return false;
    }
    if (saving && !fs::is_directory(fs::path(path).parent_path(), ec)) {
        error_ = "No such folder: " + fs::path(path).parent_path().string();
        return false;
    }
    chosen_ = path;
    if (purpose_ == Purpose::SaveBoard && !endsWith(chosen_, ".json")) chosen_ += ".board.json";
    open_ = false;
    return true;
}

bool FileChooser::draw() {
    if (!open_) return false;
    const char* title = titleFor(purpose_);
    // Open while open_ says so: a popup opened in the frame a menu item closed its menu is closed
    // with the menu (File > Export build sheet never showed the chooser), so it is opened again.
    if (justOpened_ || !ImGui::IsPopupOpen(title)) {
        ImGui::OpenPopup(title);
        justOpened_ = false;
    }
    const ImVec2 display = ImGui::GetIO().DisplaySize;
    ImGui::SetNextWindowPos({display.x * 0.5f, display.y * 0.5f}, ImGuiCond_Always, {0.5f, 0.5f});
    ImGui::SetNextWindowSize({std::min(720.0f, display.x - 40), std::min(520.0f, display.y - 40)}, ImGuiCond_Always);
    bool picked = false;
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_NoResize | ImGuiWindowFlags_NoMove)) {
        open_ = false;
        return false;
    }
    ImGui::TextWrapped("Folder: %s", folder_.c_str());
    if (ImGui::Button("Up one folder")) {
        folder_ = fs::path(folder_).parent_path().string();
        refresh();
    }
    const float listHeight = ImGui::GetContentRegionAvail().y - ImGui::GetFrameHeightWithSpacing() * 3.2f;
    if (ImGui::BeginChild("entries", {0, listHeight}, true)) {
        for (const std::string& entry : entries_) {
            const bool isDir = !entry.empty() && entry.back() == '/';
            if (ImGui::Selectable(entry.c_str(), entry == typed_, ImGuiSelectableFlags_AllowDoubleClick)) {
                if (isDir) {
                    folder_ = (fs::path(folder_) / entry.substr(0, entry.size() - 1)).string();
                    typed_.clear();
                    refresh();
                    break;
                }
                typed_ = entry;
                if (ImGui::IsMouseDoubleClicked(0)) picked = accept();
            }
        }
    }
    ImGui::EndChild();
    ImGui::TextUnformatted("File name or path:");
    ImGui::SetNextItemWidth(-1);
    if (ImGui::IsWindowAppearing()) ImGui::SetKeyboardFocusHere();
    if (ImGui::InputText("##path", &typed_, ImGuiInputTextFlags_EnterReturnsTrue)) picked = accept();
    if (!error_.empty()) ImGui::TextColored({1.0f, 0.45f, 0.4f, 1.0f}, "%s", error_.c_str());
    const bool saving = purpose_ == Purpose::SaveBoard || purpose_ == Purpose::ExportSheet ||
                        purpose_ == Purpose::ExportCircuit;
    if (ImGui::Button(saving ? "Save" : "Open", {120, 0})) picked = accept();
    ImGui::SameLine();
    if (ImGui::Button("Cancel", {120, 0}) || ImGui::IsKeyPressed(ImGui::GetKeyIndex(ImGuiKey_Escape))) open_ = false;
    if (!open_) ImGui::CloseCurrentPopup();
    ImGui::EndPopup();
    return picked;
}

}  // namespace stripsmith
