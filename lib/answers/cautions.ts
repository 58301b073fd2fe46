/** The standing caution shown with any answer on a topic that touches chemicals, air, health or building work. */
export const TOPIC_CAUTIONS: Partial<Record<string, { title: string; text: string }>> = {
  cleaning: {
    title: "Cleaning products and health",
    text: "Only trained staff use disinfectants at school, and only as the label says. Never mix bleach with ammonia or any other cleaner. If a product bothers your child's skin or breathing, tell the school nurse and follow your doctor's advice. For health questions, we follow the local health department.",
  },
  air: {
    title: "Fresh air is one layer of protection",
    text: "Better air does not replace staying home when sick or washing hands. Only licensed technicians service our air systems. If your child has asthma or another breathing condition, talk with your doctor and the school nurse. For health advice, we follow the local health department.",
  },
  building: {
    title: "Work areas and equipment",
    text: "Licensed contractors and electricians do all of our building and electrical work, and local building and fire officials inspect it. Please keep children away from fenced work areas and from equipment such as generators.",
  },
  cases: {
    title: "Health decisions",
    text: "The local health department decides who needs to quarantine and for how long. For your own child's health, ask your doctor or the school nurse. If a child has trouble breathing or seems very sick, call 911.",
  },
};
