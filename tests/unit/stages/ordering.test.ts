import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { generateNKeysBetween } from "fractional-indexing";
import { compareKeys, keyBetween, keyForPlacement, moveInList, type Placed } from "@/lib/stages/ordering";

const column = (n: number): Placed[] => generateNKeysBetween(null, null, n).map((position, i) => ({ id: `c${i}`, position }));
const order = (cards: Placed[]) => [...cards].sort(compareKeys).map((c) => c.id);

describe("keyForPlacement", () => {
  const col = column(3);
  const place = (p: Parameters<typeof keyForPlacement>[1]) => order([...col, { id: "new", position: keyForPlacement(col, p) }]);

  it("places before, after, at an index, or at the end", () => {
    expect(place({ beforeId: "c0" })).toEqual(["new", "c0", "c1", "c2"]);
    expect(place({ afterId: "c0" })).toEqual(["c0", "new", "c1", "c2"]);
    expect(place({ beforeId: "c2" })).toEqual(["c0", "c1", "new", "c2"]);
    expect(place({ position: 1 })).toEqual(["c0", "new", "c1", "c2"]);
    expect(place({ position: 99 })).toEqual(["c0", "c1", "c2", "new"]);
    expect(place({})).toEqual(["c0", "c1", "c2", "new"]);
  });

  it("puts a card at the end when its neighbour has left the column", () => {
    expect(place({ beforeId: "gone" })).toEqual(["c0", "c1", "c2", "new"]);
  });

  it("works in an empty column", () => {
    expect(typeof keyForPlacement([], { afterId: "x" })).toBe("string");
  });

  it("keeps a strict order however many cards are dropped in one place", () => {
    fc.assert(
      fc.property(fc.array(fc.nat(20), { minLength: 1, maxLength: 40 }), (drops) => {
        let cards = column(2);
        const expected = cards.map((c) => c.id);
        drops.forEach((d, i) => {
          const index = d % (cards.length + 1);
          const id = `n${i}`;
          cards = [...cards, { id, position: keyForPlacement(cards, { position: index }) }];
          expected.splice(index, 0, id);
        });
        expect(order(cards)).toEqual(expected);
        expect(new Set(cards.map((c) => c.position)).size).toBe(cards.length);
      }),
    );
  });
});

describe("keyBetween and moveInList", () => {
  it("tolerates equal neighbours by placing after them", () => {
    expect(keyBetween("a0", "a0") > "a0").toBe(true);
    expect(keyBetween(null, null)).toBe("a0");
  });

  it("moves an item within a list", () => {
    expect(moveInList(["a", "b", "c"], 0, 2)).toEqual(["b", "c", "a"]);
    expect(moveInList(["a", "b", "c"], 2, 0)).toEqual(["c", "a", "b"]);
  });
});
