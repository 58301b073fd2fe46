import type { MDXComponents } from "mdx/types";
import type { ComponentPropsWithoutRef } from "react";
import { headingId } from "@/lib/content/files";
import { AskAboutThis } from "./ask-about-this";
import { Callout } from "./callout";
import { Caution } from "./caution";
import { Co2Week } from "./co2-week";
import { ProjectTimeline } from "./project-timeline";
import { RoomFigures } from "./room-figures";
import { SignGallery } from "./sign-gallery";
import { Step, Steps } from "./steps";

function textOf(children: unknown): string {
  if (typeof children === "string") return children;
  if (Array.isArray(children)) return children.map(textOf).join("");
  return "";
}

/** The one component map every MDX render gets; lib/content/check.ts allows exactly these names. */
export const mdxComponents: MDXComponents = {
  Callout,
  Caution,
  Steps,
  Step,
  ProjectTimeline,
  RoomFigures,
  Co2Week,
  SignGallery,
  AskAboutThis,
  h2: (props: ComponentPropsWithoutRef<"h2">) => <h2 id={headingId(textOf(props.children))} className="mt-10 mb-3 scroll-mt-4 text-2xl" {...props} />,
  h3: (props: ComponentPropsWithoutRef<"h3">) => <h3 id={headingId(textOf(props.children))} className="mt-6 mb-2 scroll-mt-4 text-xl" {...props} />,
  p: (props: ComponentPropsWithoutRef<"p">) => <p className="mb-4" {...props} />,
  ul: (props: ComponentPropsWithoutRef<"ul">) => <ul className="mb-4 list-disc space-y-1 pl-6" {...props} />,
  ol: (props: ComponentPropsWithoutRef<"ol">) => <ol className="mb-4 list-decimal space-y-1 pl-6" {...props} />,
  table: (props: ComponentPropsWithoutRef<"table">) => (
    <div className="my-6 overflow-x-auto">
      <table className="w-full border-collapse text-left" {...props} />
    </div>
  ),
  th: (props: ComponentPropsWithoutRef<"th">) => <th className="border-b-2 border-harbour p-2" {...props} />,
  td: (props: ComponentPropsWithoutRef<"td">) => <td className="border-b border-paper-line p-2" {...props} />,
};
