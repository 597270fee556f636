// Add, remove and replace one element of one of the board's lists (parts, links, cuts, off-board
// parts, wires). The per-kind files (part_commands.hpp, link_commands.hpp ...) name the concrete
// commands; this file holds the logic they share.
//
// Addressing: an element is addressed by its index in its list. Every command keeps the full
// value of the element it adds, removes or replaces and checks, before changing anything, that
// the element at that index is the one expected (OutOfStepError otherwise). Undo puts elements
// back at the very index they came from, so a board after undo is identical, order included.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <utility>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/edit/mergeable.hpp"
#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

// A List type describes one of the board's lists:
//   using Element = ...;
//   static std::vector<Element>& of(Board&);
//   static const std::vector<Element>& of(const Board&);
//   static std::string addLabel(const Element&), removeLabel(const Element&);
//   static std::string changeLabel(const Element& before, const Element& after);
//   static std::vector<Hole> holes(const Element&);

/// Inserts an element: at the end of its list by default, or at a given index.
template <class List>
class AddElement : public Command {
public:
    using Element = typename List::Element;
    explicit AddElement(Element element, std::optional<std::size_t> index = std::nullopt,
                        std::string label = {})
        : element_(std::move(element)), index_(index), label_(std::move(label)) {}

    void apply(Board& board) override {
        auto& list = List::of(board);
        // An append settles its index on first apply, so redo inserts at the same place.
        if (!index_) index_ = list.size();
        requireInStep(*index_ <= list.size(), label(), "insert index past the end of the list");
        list.insert(list.begin() + static_cast<std::ptrdiff_t>(*index_), element_);
    }
    void revert(Board& board) override {
        auto& list = List::of(board);
        requireInStep(index_ && *index_ < list.size() && list[*index_] == element_, label(),
                      "the added element is not where it was put");
        list.erase(list.begin() + static_cast<std::ptrdiff_t>(*index_));
    }
    std::string label() const override {
        return label_.empty() ? List::addLabel(element_) : label_;
    }
    std::vector<Hole> touched() const override { return List::holes(element_); }
    const Element& element() const { return element_; }

private:
    Element element_;
    std::optional<std::size_t> index_;
    std::string label_;
};

/// Removes the element at an index.
template <class List>
class RemoveElement : public Command {
public:
    using Element = typename List::Element;
    /// Takes the element's present value from `board`; `index` must be in range.
    RemoveElement(const Board& board, std::size_t index, std::string label = {})
        : index_(index), label_(std::move(label)) {
        const auto& list = List::of(board);
        requireInStep(index < list.size(), "Remove", "index past the end of the list");
        element_ = list[index];
    }

    void apply(Board& board) override {
        auto& list = List::of(board);
        requireInStep(index_ < list.size() && list[index_] == element_, label(),
                      "the element to remove is not at its index");
        list.erase(list.begin() + static_cast<std::ptrdiff_t>(index_));
    }
    void revert(Board& board) override {
        auto& list = List::of(board);
        requireInStep(index_ <= list.size(), label(), "cannot put the element back at its index");
        list.insert(list.begin() + static_cast<std::ptrdiff_t>(index_), element_);
    }
    std::string label() const override {
        return label_.empty() ? List::removeLabel(element_) : label_;
    }
    std::vector<Hole> touched() const override { return List::holes(element_); }
    std::size_t index() const { return index_; }
    const Element& element() const { return element_; }

private:
    std::size_t index_;
    Element element_{};
    std::string label_;
};

/// Replaces the element at an index with a new value (a move, rotation, stretch or property
/// edit). A following replace of the same element merges into it: the first old value is kept,
/// the newest new value taken, so a drag is one undo step.
template <class List>
class ReplaceElement : public MergeableCommand {
public:
    using Element = typename List::Element;
    /// Takes the old value from `board`; `index` must be in range.
    ReplaceElement(const Board& board, std::size_t index, Element after, std::string label = {})
        : index_(index), after_(std::move(after)), label_(std::move(label)) {
        const auto& list = List::of(board);
        requireInStep(index < list.size(), "Change", "index past the end of the list");
        before_ = list[index];
    }

    void apply(Board& board) override { swapIn(board, before_, after_); }
    void revert(Board& board) override { swapIn(board, after_, before_); }
    std::string label() const override {
        return label_.empty() ? List::changeLabel(before_, after_) : label_;
    }
    std::vector<Hole> touched() const override {
        auto holes = List::holes(before_);
        for (const Hole& h : List::holes(after_)) holes.push_back(h);
        return holes;
    }
    bool canMergeWith(const Command& next) const override {
        const auto* other = dynamic_cast<const ReplaceElement*>(&next);
        return other != nullptr && other->index_ == index_ && other->before_ == after_;
    }
    std::size_t index() const { return index_; }
    const Element& before() const { return before_; }
    const Element& after() const { return after_; }

protected:
    void takeNewState(const Command& next) override {
        const auto& other = static_cast<const ReplaceElement&>(next);
        after_ = other.after_;
        if (label_.empty()) label_ = other.label_;
    }

private:
    void swapIn(Board& board, const Element& expected, const Element& value) {
        auto& list = List::of(board);
        requireInStep(index_ < list.size() && list[index_] == expected, label(),
                      "the element to change is not at its index");
        list[index_] = value;
    }

    std::size_t index_;
    Element before_{};
    Element after_;
    std::string label_;
};

}  // namespace netcheck::edit
