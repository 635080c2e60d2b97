import { useEffect, useRef } from "react";

/**
 * Hidden fields of the sign-in form with what the browser says of its reader: the
 * languages it asks for and its time zone. The server takes them as the first
 * choice of a person who has not chosen on the account page yet. Filled after
 * hydration, so the server's markup and the browser's first render agree; without
 * JavaScript they stay empty and the defaults apply.
 */
export function BrowserDisplayHints() {
  const languages = useRef<HTMLInputElement>(null);
  const timeZone = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (languages.current)
      languages.current.value = navigator.languages.join(",");
    if (timeZone.current)
      timeZone.current.value =
        Intl.DateTimeFormat().resolvedOptions().timeZone;
  }, []);
  return (
    <>
      <input type="hidden" name="browserLanguages" ref={languages} />
      <input type="hidden" name="browserTimeZone" ref={timeZone} />
    </>
  );
}
