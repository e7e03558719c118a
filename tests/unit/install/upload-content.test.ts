import { describe, expect, it } from "vitest";
import { MAX_UPLOAD_PIXELS, pdfRefusal, pixelRefusal } from "@/lib/install/upload-rules";
import { contentDisposition } from "@/lib/install/disposition";

const bytes = (s: string) => new TextEncoder().encode(s);

describe("what an upload's contents may be", () => {
  it("caps photos by pixels, not by bytes", () => {
    expect(pixelRefusal(4000, 3000)).toBeNull(); // 12 MP, a common phone photo
    expect(pixelRefusal(8160, 6120)).toBeNull(); // just under 50 MP
    expect(pixelRefusal(8900, 8900)).toMatch(/8900 × 8900 pixels; the limit is 50 million/);
    expect(pixelRefusal(MAX_UPLOAD_PIXELS + 1, 1)).not.toBeNull();
    expect(pixelRefusal(0, 100)).toMatch(/couldn't be read/);
  });

  it("takes a PDF that ends like one and refuses a web page behind a PDF header", () => {
    expect(pdfRefusal(bytes("%PDF-1.4\n1 0 obj << >> endobj\n%%EOF\n"))).toBeNull();
    expect(pdfRefusal(bytes("%PDF-1.7\n<!doctype html><html><script>x</script></html>"))).not.toBeNull();
    expect(pdfRefusal(bytes("%PDF-1.7\n<HTML><body>hi</body></HTML>\n%%EOF"))).not.toBeNull();
    expect(pdfRefusal(bytes("%PDF-1.4\n1 0 obj << >> endobj\n"))).not.toBeNull();
  });
});

describe("contentDisposition", () => {
  it("keeps a plain name and encodes the rest", () => {
    expect(contentDisposition("inline", "tank.jpg")).toBe(`inline; filename="tank.jpg"; filename*=UTF-8''tank.jpg`);
    expect(contentDisposition("attachment", "Ölfilter (2).pdf")).toBe(`attachment; filename="_lfilter (2).pdf"; filename*=UTF-8''%C3%96lfilter%20%282%29.pdf`);
  });

  it("never lets a name close the header's quotes or add a parameter", () => {
    const header = contentDisposition("inline", 'a";\r\nX-Evil: 1; filename="b.html');
    expect(header).not.toMatch(/[\r\n]/);
    expect(header.split('"').length).toBe(3);
  });
});
