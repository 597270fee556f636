// Sections: loading and saving | actions | dialogs | autosave.
#include "editor/file_actions.hpp"

#include <spawn.h>
#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <filesystem>
#include <string>
#include <vector>

#include <imgui.h>
#include <nlohmann/json.hpp>

#include "editor/sheet/sheet.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/model/printable.hpp"

namespace stripsmith {

namespace fs = std::filesystem;

namespace {

void showError(EditorApp& app, std::string title, std::string text) {
    app.dialogs.errorTitle = std::move(title);
    app.dialogs.errorText = std::move(text);
}

std::string folderOf(const std::string& path) {
    if (path.empty()) return {};
    return fs::path(path).parent_path().string();
}

// Reads a file from a newer format version as if it were this version, to show it read-only.
std::optional<netcheck::Board> readNewerVersion(const std::string& text, const std::string& path) {
    auto json = nlohmann::json::parse(text, nullptr, false);
    if (!json.is_object()) return std::nullopt;
    json["version"] = netcheck::kBoardVersion;
    auto result = netcheck::readBoard(json.dump(), path);
    return result.value;
}

// Other editors with the same file open: each save would replace the other's without a word.
void warnIfOpenElsewhere(EditorApp& app, const std::string& path) {
    const std::vector<long> others = editorsWithOpen(app.recoveryDir, path);
    if (others.empty()) return;
    app.dialogs.notice = "Another Stripsmith window (process " + std::to_string(others.front()) +
                         ") has this file open too.\n\nIf you both make changes, Stripsmith "
                         "asks before a save would replace changes saved from the other window.";
}

void startOver(EditorApp& app) {
    app.selection.clear();
    app.tool.cancel();
    app.view.fitPending = true;
    app.view.focusedFinding.reset();
}

}  // namespace

// ---- loading and saving ----------------------------------------------------------------------

bool loadBoardFile(EditorApp& app, const std::string& path) {
    const netcheck::ReadLimits limits;
    auto text = netcheck::readFileLimited(path, limits.maxBytes);
    if (!text.ok()) {
        showError(app, "Cannot open the board", text.error ? text.error->describe() : "cannot read " + path);
        return false;
    }
    auto result = netcheck::readBoard(*text.value, path, limits);
    if (!result.ok()) {
        const std::string message = result.error ? result.error->describe() : "unreadable board file";
        if (message.find("is newer than this program reads") != std::string::npos) {
            if (auto board = readNewerVersion(*text.value, path)) {
                app.doc.reset(std::move(*board), path, true);
                app.diskStamp = stampOf(*text.value, path);
                app.dialogs.notice = message + "\n\nThe board is open read-only so that nothing it holds is lost. "
                                               "Use File > Save As to keep a copy in this version's format.";
                startOver(app);
                app.recent.add(path);
                return true;
            }
        }
        showError(app, "Cannot open the board", message + "\n\nThe board you had open is unchanged.");
        return false;
    }
    // Reloading the file already open (after it changed on disk) needs no second warning.
    const bool reopening = path == app.doc.path();
    app.doc.reset(std::move(*result.value), path);
    app.diskStamp = stampOf(*text.value, path);
    startOver(app);
    app.recent.add(path);
    if (!reopening) warnIfOpenElsewhere(app, path);
    app.say("Opened " + path);
    return true;
}

bool saveBoardFile(EditorApp& app, const std::string& path, bool overwrite) {
    // Saved from another editor (or program) since it was read here: ask, never replace unseen.
    if (!overwrite && path == app.doc.path() && app.diskStamp &&
        changedOnDisk(*app.diskStamp, path)) {
        app.dialogs.diskChanged = true;
        return false;
    }
    const std::string text = netcheck::writeBoard(app.doc.board());
    if (auto error = netcheck::saveFileAtomically(path, text)) {
        showError(app, "Could not save", *error + "\n\nThe file on disk is unchanged.");
        return false;
    }
    app.doc.markSaved(path);
    app.diskStamp = stampOf(text, path);
    app.recent.add(path);
    app.recovery.clearCopy();
    app.say("Saved " + path);
    return true;
}

bool exportSheetTo(EditorApp& app, const std::string& path, bool letter) {
    sheet::SheetOptions options;
    options.paper = letter ? sheet::Paper::Letter : sheet::Paper::A4;
    if (auto error = sheet::exportSheet(app.doc.board(), options, path)) {
        showError(app, "Could not write the build sheet", *error);
        return false;
    }
    app.say("Wrote the build sheet " + path);
    return true;
}

// ---- actions -----------------------------------------------------------------------------------

namespace {

void doPending(EditorApp& app, PendingAction action, const std::string& path) {
    switch (action) {
    case PendingAction::New:
        app.doc.reset(netcheck::Board{}, {});
        app.diskStamp.reset();
        startOver(app);
        app.say("New board");
        break;
    case PendingAction::Open:
        app.chooser.open(FileChooser::Purpose::OpenBoard, folderOf(app.doc.path()));
        break;
    case PendingAction::OpenPath:
        loadBoardFile(app, path);
        break;
    case PendingAction::Quit:
        app.quitNow = true;
        break;
    case PendingAction::None:
        break;
    }
}

void askThen(EditorApp& app, PendingAction action, const std::string& path = {}) {
    if (!app.doc.modified()) {
        doPending(app, action, path);
        return;
    }
    app.dialogs.pending = action;
    app.dialogs.pendingPath = path;
    app.dialogs.askUnsaved = true;
}

}  // namespace

void actionNew(EditorApp& app) { askThen(app, PendingAction::New); }
void actionOpen(EditorApp& app) { askThen(app, PendingAction::Open); }
void actionOpenPath(EditorApp& app, const std::string& path) { askThen(app, PendingAction::OpenPath, path); }
void actionQuit(EditorApp& app) { askThen(app, PendingAction::Quit); }

void actionSave(EditorApp& app) {
    if (app.doc.path().empty() || app.doc.readOnly()) actionSaveAs(app);
    else saveBoardFile(app, app.doc.path());
}

void actionSaveAs(EditorApp& app) {
    const std::string name = app.doc.path().empty() ? "untitled.board.json" : fs::path(app.doc.path()).filename().string();
    app.chooser.open(FileChooser::Purpose::SaveBoard, folderOf(app.doc.path()), name);
}

// ---- dialogs -----------------------------------------------------------------------------------

namespace {

void centreNext() {
    const ImVec2 d = ImGui::GetIO().DisplaySize;
    ImGui::SetNextWindowPos({d.x * 0.5f, d.y * 0.5f}, ImGuiCond_Always, {0.5f, 0.5f});
}

void drawUnsavedPrompt(EditorApp& app) {
    const char* title = "Unsaved changes";
    if (app.dialogs.askUnsaved && !ImGui::IsPopupOpen(title)) ImGui::OpenPopup(title);
    centreNext();
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_AlwaysAutoResize)) return;
    ImGui::Text("The board has changes that are not saved.");
    ImGui::Text("Save them first?");
    ImGui::Spacing();
    const PendingAction action = app.dialogs.pending;
    const std::string path = app.dialogs.pendingPath;
    auto close = [&] {
        app.dialogs.askUnsaved = false;
        app.dialogs.pending = PendingAction::None;
        ImGui::CloseCurrentPopup();
    };
    const bool save = ImGui::Button("Save", {110, 0});
    app.log.item("unsaved-save");
    if (save) {
        if (!app.doc.path().empty() && !app.doc.readOnly()) {
            close();
            if (saveBoardFile(app, app.doc.path())) {
                doPending(app, action, path);
            } else if (app.dialogs.diskChanged) {
                // The action waits for the answer about the file changed on disk.
                app.dialogs.pending = action;
                app.dialogs.pendingPath = path;
            }
        } else {
            // The pending action waits for the Save As chooser.
            app.dialogs.askUnsaved = false;
            ImGui::CloseCurrentPopup();
            actionSaveAs(app);
        }
    }
    ImGui::SameLine();
    const bool discard = ImGui::Button("Don't save", {110, 0});
    app.log.item("unsaved-dont-save");
    if (discard) {
        close();
        doPending(app, action, path);
    }
    ImGui::SameLine();
    const bool cancel = ImGui::Button("Cancel", {110, 0});
    app.log.item("unsaved-cancel");
    if (cancel) close();
    ImGui::EndPopup();
}

void drawMessage(EditorApp& app, const char* title, std::string& text, bool& clear) {
    if (!text.empty() && !ImGui::IsPopupOpen(title)) ImGui::OpenPopup(title);
    centreNext();
    ImGui::SetNextWindowSizeConstraints({360, 0}, {760, 600});
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_AlwaysAutoResize)) return;
    ImGui::PushTextWrapPos(ImGui::GetFontSize() * 40.0f);
    ImGui::TextUnformatted(text.c_str());
    ImGui::PopTextWrapPos();
    ImGui::Spacing();
    const bool ok = ImGui::Button("OK", {110, 0});
    app.log.item("message-ok");
    // Not on the frame it appears: the Enter that accepted a file chooser would close it unseen.
    if (ok || (ImGui::IsKeyPressed(ImGui::GetKeyIndex(ImGuiKey_Enter)) && !ImGui::IsWindowAppearing())) {
        clear = true;
        ImGui::CloseCurrentPopup();
    }
    ImGui::EndPopup();
}

// The restored board becomes this editor's own recovery copy; the left copy is deleted only once
// that is written, so a crash right after restoring loses nothing either.
void adoptRestoredCopy(EditorApp& app) {
    if (!app.recovery.active()) return;
    if (app.recovery.write({netcheck::writeBoard(app.doc.board()), app.doc.path()})) return;
    app.autosavedRevision = app.doc.revision();
    app.dialogs.recovery->slot.remove();
}

void drawDiskChanged(EditorApp& app) {
    const char* title = "File changed on disk";
    if (app.dialogs.diskChanged && !ImGui::IsPopupOpen(title)) ImGui::OpenPopup(title);
    centreNext();
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_AlwaysAutoResize)) return;
    const std::string file = app.doc.path();  // a copy: loading replaces the document's
    ImGui::Text("%s", netcheck::escapeControls(file).c_str());
    ImGui::Text("was changed on disk since you opened or saved it here (another window or program");
    ImGui::Text("saved it). Saving now would replace those changes.");
    ImGui::Spacing();
    const PendingAction action = app.dialogs.pending;
    const std::string path = app.dialogs.pendingPath;
    auto close = [&] {
        app.dialogs.diskChanged = false;
        ImGui::CloseCurrentPopup();
    };
    const bool saveAs = ImGui::Button("Save As...", {190, 0});
    app.log.item("changed-save-as");
    ImGui::SameLine();
    const bool overwrite = ImGui::Button("Overwrite", {190, 0});
    app.log.item("changed-overwrite");
    ImGui::SameLine();
    const bool reload = ImGui::Button("Reload (drop my changes)", {190, 0});
    app.log.item("changed-reload");
    ImGui::SameLine();
    const bool cancel = ImGui::Button("Cancel", {190, 0});
    app.log.item("changed-cancel");
    if (saveAs) {
        close();
        actionSaveAs(app);  // a waiting action goes on once saved there
    } else if (overwrite) {
        close();
        app.dialogs.pending = PendingAction::None;
        if (saveBoardFile(app, file, true)) doPending(app, action, path);
    } else if (reload || cancel) {
        close();
        app.dialogs.pending = PendingAction::None;
        if (reload) loadBoardFile(app, file);
    }
    ImGui::EndPopup();
}

void drawRecoveryOffer(EditorApp& app) {
    const char* title = "Restore unsaved work?";
    if (app.dialogs.recovery && !ImGui::IsPopupOpen(title)) ImGui::OpenPopup(title);
    centreNext();
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_AlwaysAutoResize)) return;
    const RecoveryFile& rec = app.dialogs.recovery->file;
    ImGui::Text("Stripsmith did not close properly last time.");
    ImGui::Text("An automatic copy of the board you were working on was kept%s%s.",
                rec.originalPath.empty() ? "" : " (", rec.originalPath.empty() ? "" : (rec.originalPath + ")").c_str());
    ImGui::Spacing();
    const bool restore = ImGui::Button("Restore", {110, 0});
    app.log.item("restore");
    if (restore) {
        auto result = netcheck::readBoard(rec.boardText, "recovered board");
        if (result.ok()) {
            app.doc.reset(std::move(*result.value), rec.originalPath, false, true);
            app.diskStamp.reset();
            startOver(app);
            adoptRestoredCopy(app);
            app.say("Restored the automatic copy; save it to keep it.");
        } else {
            showError(app, "Cannot restore", result.error ? result.error->describe() : "unreadable copy");
        }
        app.dialogs.recovery.reset();  // a copy not adopted stays, offered at the next start
        ImGui::CloseCurrentPopup();
    }
    ImGui::SameLine();
    const bool discard = ImGui::Button("Discard", {110, 0});
    app.log.item("discard");
    if (discard) {
        // Only here is a left copy deleted; then the next one, if any, is offered.
        app.dialogs.recovery->slot.remove();
        app.dialogs.recovery = findLeftCopy(app.recoveryDir);
        ImGui::CloseCurrentPopup();
    }
    ImGui::EndPopup();
}

// Opens the folder in the desktop's file manager with xdg-open. A short-lived sh starts it in the
// background and ends at once (reaped here), so the file manager is never this editor's child and
// leaves no zombie; the folder is passed as an argument, never as shell text. Under the
// end-to-end log the command is logged instead, so tests open no file manager.
void openFolder(EditorApp& app, const std::string& folder) {
    if (app.log.on()) {
        app.log.note("open-folder xdg-open " + folder);
        return;
    }
    std::string shell = "sh", flag = "-c", script = "xdg-open \"$1\" >/dev/null 2>&1 &", name = "sh",
                argument = folder;
    char* argv[] = {shell.data(), flag.data(), script.data(), name.data(), argument.data(), nullptr};
    pid_t child = 0;
    if (posix_spawnp(&child, "sh", nullptr, nullptr, argv, environ) != 0) {
        app.say("Could not open the folder " + folder);
        return;
    }
    waitpid(child, nullptr, 0);
}

void sheetPaperChoice(EditorApp& app) {
    SheetExport& s = app.dialogs.sheet;
    ImGui::Text("Build sheet: %s", netcheck::escapeControls(s.path).c_str());
    ImGui::Spacing();
    ImGui::TextUnformatted("Paper");
    // ISO 216: A4 is 210 x 297 mm. ANSI/ASME Y14.1: US Letter (size A) is 8.5 x 11 in,
    // 215.9 x 279.4 mm.
    if (ImGui::RadioButton("A4 (210 x 297 mm)", !s.letter)) s.letter = false;
    app.log.item("sheet-a4");
    if (ImGui::RadioButton("US Letter (8.5 x 11 in)", s.letter)) s.letter = true;
    app.log.item("sheet-letter");
    ImGui::Spacing();
    const bool write = ImGui::Button("Export", {130, 0});
    app.log.item("sheet-export");
    ImGui::SameLine();
    const bool cancel = ImGui::Button("Cancel", {130, 0});
    app.log.item("sheet-cancel");
    if (write) {
        s.stage = exportSheetTo(app, s.path, s.letter) ? SheetExport::Stage::Written
                                                       : SheetExport::Stage::Closed;
    } else if (cancel) {
        s.stage = SheetExport::Stage::Closed;
    }
}

void sheetWritten(EditorApp& app) {
    SheetExport& s = app.dialogs.sheet;
    ImGui::Text("The build sheet (%s) is written to", s.letter ? "US Letter" : "A4");
    ImGui::TextUnformatted(netcheck::escapeControls(s.path).c_str());
    ImGui::Spacing();
    if (ImGui::Button("Open folder", {130, 0})) openFolder(app, folderOf(s.path).empty() ? "." : folderOf(s.path));
    app.log.item("sheet-open-folder");
    ImGui::SameLine();
    if (ImGui::Button("Close", {130, 0})) s.stage = SheetExport::Stage::Closed;
    app.log.item("sheet-close");
}

void drawSheetExport(EditorApp& app) {
    const char* title = "Export build sheet";
    const bool wanted = app.dialogs.sheet.stage != SheetExport::Stage::Closed;
    if (wanted && !ImGui::IsPopupOpen(title)) ImGui::OpenPopup(title);
    centreNext();
    if (!ImGui::BeginPopupModal(title, nullptr, ImGuiWindowFlags_AlwaysAutoResize)) return;
    if (app.dialogs.sheet.stage == SheetExport::Stage::ChoosePaper) sheetPaperChoice(app);
    else if (app.dialogs.sheet.stage == SheetExport::Stage::Written) sheetWritten(app);
    if (app.dialogs.sheet.stage == SheetExport::Stage::Closed) ImGui::CloseCurrentPopup();
    ImGui::EndPopup();
}

// Which dialogs are open, so scripted tests wait for a dialog before they type or click in it.
void logDialogs(EditorApp& app) {
    if (!app.log.on()) return;
    std::string state = app.chooser.isOpen() ? "chooser" : "-";
    if (app.dialogs.askUnsaved) state += " unsaved";
    if (app.dialogs.diskChanged) state += " changed-on-disk";
    if (app.dialogs.recovery) state += " restore " + app.dialogs.recovery->file.originalPath;
    if (!app.dialogs.errorText.empty())
        state += " error " + app.dialogs.errorTitle + ": " + app.dialogs.errorText;
    if (!app.dialogs.notice.empty()) state += " note " + app.dialogs.notice;
    if (app.dialogs.sheet.stage == SheetExport::Stage::ChoosePaper) state += " sheet-paper";
    if (app.dialogs.sheet.stage == SheetExport::Stage::Written)
        state += " sheet-written " + app.dialogs.sheet.path;
    std::replace(state.begin(), state.end(), '\n', ' ');
    app.log.dialogs(state);
}

}  // namespace

void drawFileDialogs(EditorApp& app) {
    const bool wasOpen = app.chooser.isOpen();
    if (app.chooser.draw()) {
        const std::string& path = app.chooser.chosen();
        switch (app.chooser.purpose()) {
        case FileChooser::Purpose::OpenBoard: loadBoardFile(app, path); break;
        case FileChooser::Purpose::SaveBoard:
            if (saveBoardFile(app, path) && app.dialogs.pending != PendingAction::None)
                doPending(app, app.dialogs.pending, app.dialogs.pendingPath);
            app.dialogs.pending = PendingAction::None;
            break;
        case FileChooser::Purpose::OpenCircuit:
        case FileChooser::Purpose::ExportCircuit: app.chosenForPanel = path; break;
        case FileChooser::Purpose::ExportSheet:
            app.dialogs.sheet.path = path;
            app.dialogs.sheet.stage = SheetExport::Stage::ChoosePaper;
            break;
        }
    } else if (wasOpen && !app.chooser.isOpen() && !app.dialogs.askUnsaved) {
        app.dialogs.pending = PendingAction::None;  // Save As cancelled: so is what waited for it
    }
    drawUnsavedPrompt(app);
    drawDiskChanged(app);
    drawRecoveryOffer(app);
    drawSheetExport(app);
    bool clearError = false, clearNotice = false;
    std::string errorTitle = app.dialogs.errorTitle.empty() ? "Problem" : app.dialogs.errorTitle;
    drawMessage(app, errorTitle.c_str(), app.dialogs.errorText, clearError);
    drawMessage(app, "Note", app.dialogs.notice, clearNotice);
    if (clearError) app.dialogs.errorText.clear();
    if (clearNotice) app.dialogs.notice.clear();
    logDialogs(app);
}

// ---- autosave -----------------------------------------------------------------------------------

void tickAutosave(EditorApp& app, double seconds) {
    if (app.recoveryDir.empty()) return;
    app.recovery.setOpenFile(app.doc.path());  // does nothing while it is the same
    app.sinceAutosave += seconds;
    if (app.sinceAutosave < app.autosaveSeconds) return;
    app.sinceAutosave = 0;
    if (!app.doc.modified() || app.doc.revision() == app.autosavedRevision) return;
    RecoveryFile rec{netcheck::writeBoard(app.doc.board()), app.doc.path()};
    if (auto error = app.recovery.write(rec)) {
        app.say("Autosave failed: " + *error);
        return;
    }
    app.autosavedRevision = app.doc.revision();
    app.say("Autosaved a recovery copy");
}

void endSession(EditorApp& app) {
    // This editor's own copy only: other editors' copies, and a left copy offered but neither
    // restored nor discarded, stay (the offer's slot is released with it, its files kept).
    app.recovery.remove();
}

}  // namespace stripsmith
