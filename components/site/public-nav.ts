/** The public site's main links, in one place so header and footer agree. */
export const PUBLIC_NAV = [
  { href: "/", label: "Home" },
  { href: "/schools", label: "Schools" },
  { href: "/district/cleaning-and-disinfection", label: "Cleaning" },
  { href: "/district/when-a-case-is-reported", label: "If a case is reported" },
  { href: "/answers", label: "Answers" },
  { href: "/ask", label: "Ask a question" },
] as const;
