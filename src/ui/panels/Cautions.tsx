import { cautionItems } from "./cautionItems.ts";

/** Always on screen: what these pictures can and cannot support (the README's "Read with care", complete). */
export function Cautions() {
  return (
    <footer className="cautions" aria-label="cautions">
      <strong className="cautions-title">Read with care</strong>
      <ul>
        {cautionItems.map((item) => (
          <li key={item.heading}>
            <strong>{item.heading}</strong> {item.text}
          </li>
        ))}
      </ul>
    </footer>
  );
}
