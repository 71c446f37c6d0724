type Props = { text: string };

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** Plain e-mail text with its web addresses made clickable (reset links in the demo). */
export function LinkedText({ text }: Props) {
  return (
    <p className="whitespace-pre-wrap break-words">
      {text.split(URL_PATTERN).map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="text-link">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </p>
  );
}
