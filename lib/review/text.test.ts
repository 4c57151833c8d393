import { describe, expect, it } from "vitest";
import { linkify } from "./linkify";
import { initialsOf, mentionedIn, mentionQuery } from "./mentions";

describe("linkify: text stays text, web links become links", () => {
  it("cuts out http and https links, leaving trailing punctuation as text", () => {
    expect(linkify("See https://example.test/a?b=1. And (http://x.test/y).")).toEqual([
      { text: "See " }, { text: "https://example.test/a?b=1", href: "https://example.test/a?b=1" }, { text: ". And (" },
      { text: "http://x.test/y", href: "http://x.test/y" }, { text: ")." },
    ]);
  });
  it("never makes a link of another scheme, and keeps markup as plain text", () => {
    const pieces = linkify('javascript:alert(1) <a href="javascript:x">y</a> data:text/html,<b>');
    expect(pieces.every((p) => p.href === undefined)).toBe(true);
    expect(pieces.map((p) => p.text).join("")).toBe('javascript:alert(1) <a href="javascript:x">y</a> data:text/html,<b>');
  });
  it("does not let quotes or angle brackets into an address", () => {
    const [, link] = linkify('go https://ok.test/"onmouseover=alert(1)');
    expect(link).toEqual({ text: "https://ok.test/", href: "https://ok.test/" });
  });
  it("keeps a bracket that is part of the address", () => {
    expect(linkify("https://w.test/Pump_(hydraulic)")[0]).toEqual({ text: "https://w.test/Pump_(hydraulic)", href: "https://w.test/Pump_(hydraulic)" });
  });
});

describe("mentions", () => {
  const people = [{ id: "a", name: "Ann" }, { id: "b", name: "Anna Lee" }, { id: "c", name: "Tobias Venn" }];
  it("finds a person's whole name after @, any case, once", () => {
    expect(mentionedIn("@anna lee and @TOBIAS VENN, and @Tobias Venn again", people)).toEqual(["b", "c"]);
  });
  it("does not take @Ann for @Anna Lee, nor an e-mail address", () => {
    expect(mentionedIn("@Anna Lee", people)).toEqual(["b"]);
    expect(mentionedIn("write to ann@Ann.example", people)).toEqual(["a"]);
    expect(mentionedIn("@Annabel", people)).toEqual([]);
  });
  it("reads the @query being typed, for the picker", () => {
    expect(mentionQuery("Hi @Tob", 7)).toEqual({ start: 3, query: "Tob" });
    expect(mentionQuery("mail me@home", 12)).toBeNull();
    expect(mentionQuery("no at here", 5)).toBeNull();
  });
  it("initials", () => {
    expect(initialsOf("Imogen Pryce")).toBe("IP");
    expect(initialsOf("  nia  ")).toBe("N");
    expect(initialsOf("Jean-Luc de la Tour")).toBe("JT");
  });
});
